#!/usr/bin/env python3
"""Start-up figures of Plumb's bundles: runs each variant's command in turn, round after round
(interleaved, so a change in the machine's load falls on every variant alike), and prints the
median and minimum wall time and the median CPU time (user + system) of each.

    python3 dist/test/startup-figures.py ROUNDS NAME=COMMAND [NAME=COMMAND ...]

COMMAND is split on blanks (no shell). Output is discarded; a non-zero exit that is not 0 or 1
(Plumb's "findings") stops the run, so a broken variant cannot pass for a fast one. CPU time is
the steadier figure on a shared machine: waiting for a core counts in wall time only.
"""
import os
import statistics
import subprocess
import sys
import time


def run(argv):
    before = os.times()
    start = time.perf_counter()
    code = subprocess.call(argv, stdout=subprocess.DEVNULL, stderr=subprocess.DEVNULL)
    wall = time.perf_counter() - start
    after = os.times()
    cpu = (after.children_user - before.children_user) + (after.children_system - before.children_system)
    if code not in (0, 1):
        sys.exit(f"{' '.join(argv)}: exit code {code}")
    return wall, cpu


def main():
    if len(sys.argv) < 3 or not sys.argv[1].isdigit():
        sys.exit(__doc__)
    rounds = int(sys.argv[1])
    variants = []
    for spec in sys.argv[2:]:
        name, _, command = spec.partition("=")
        if not command:
            sys.exit(f"not NAME=COMMAND: {spec}")
        variants.append((name, command.split()))
    for _, argv in variants:  # one warm-up each: file caches
        run(argv)
    walls = {name: [] for name, _ in variants}
    cpus = {name: [] for name, _ in variants}
    for _ in range(rounds):
        for name, argv in variants:
            wall, cpu = run(argv)
            walls[name].append(wall)
            cpus[name].append(cpu)
    width = max(len(name) for name, _ in variants)
    print(f"{'variant':<{width}}  median wall  min wall  median CPU  ({rounds} runs each, ms)")
    for name, _ in variants:
        print(f"{name:<{width}}  {statistics.median(walls[name]) * 1000:11.0f}  {min(walls[name]) * 1000:8.0f}"
              f"  {statistics.median(cpus[name]) * 1000:10.0f}")


if __name__ == "__main__":
    main()
