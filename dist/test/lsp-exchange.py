#!/usr/bin/env python3
"""One language-server session against an installed Plumb: initialize, initialized, shutdown,
exit, over stdin/stdout as an editor would.

    python3 dist/test/lsp-exchange.py PLUMB [ARGS...]      (runs `PLUMB ARGS... lsp`)

Passes when the server answers initialize with its capabilities and shutdown with null, writes
nothing but protocol frames to stdout, and exits 0 after `exit`, all within 60 seconds.
Prints one line and exits 0 when it passes, 1 otherwise.
"""
import json
import subprocess
import sys

TIMEOUT_S = 60


def frame(message):
    body = json.dumps(message).encode("utf-8")
    return b"Content-Length: %d\r\n\r\n" % len(body) + body


def frames(data):
    """The JSON messages in `data`, or an error when anything else is on the stream."""
    messages = []
    rest = data
    while rest:
        head, sep, rest = rest.partition(b"\r\n\r\n")
        if not sep:
            raise ValueError(f"not a protocol frame: {head[:80]!r}")
        length = None
        for line in head.split(b"\r\n"):
            name, _, value = line.partition(b":")
            if name.strip().lower() == b"content-length":
                length = int(value)
            elif name.strip().lower() != b"content-type":
                raise ValueError(f"not a protocol header: {line[:80]!r}")
        if length is None or len(rest) < length:
            raise ValueError("a frame without its Content-Length or cut short")
        messages.append(json.loads(rest[:length]))
        rest = rest[length:]
    return messages


def main():
    if len(sys.argv) < 2:
        sys.exit(__doc__)
    command = sys.argv[1:] + ["lsp"]
    stdin = b"".join([
        frame({"jsonrpc": "2.0", "id": 1, "method": "initialize",
               "params": {"processId": None, "rootUri": None, "capabilities": {}}}),
        frame({"jsonrpc": "2.0", "method": "initialized", "params": {}}),
        frame({"jsonrpc": "2.0", "id": 2, "method": "shutdown"}),
        frame({"jsonrpc": "2.0", "method": "exit"}),
    ])
    try:
        done = subprocess.run(command, input=stdin, capture_output=True, timeout=TIMEOUT_S)
    except subprocess.TimeoutExpired:
        print(f"lsp: FAIL no exit within {TIMEOUT_S} s: {' '.join(command)}")
        return 1
    problems = []
    try:
        by_id = {m.get("id"): m for m in frames(done.stdout) if "id" in m}
    except ValueError as e:
        by_id = {}
        problems.append(f"stdout is not clean protocol ({e})")
    init = by_id.get(1, {})
    if "capabilities" not in init.get("result", {}):
        problems.append(f"initialize answered {json.dumps(init)[:200]}")
    shutdown = by_id.get(2)
    if shutdown is None or shutdown.get("result", "missing") is not None or "error" in shutdown:
        problems.append(f"shutdown answered {json.dumps(shutdown)[:200]}")
    if done.returncode != 0:
        problems.append(f"exit code {done.returncode}")
    if problems:
        print(f"lsp: FAIL {' '.join(command)}: " + "; ".join(problems))
        err = done.stderr.decode("utf-8", "replace").strip()
        if err:
            print("  stderr: " + err[:2000].replace("\n", "\n  stderr: "))
        return 1
    print(f"lsp: ok initialize/shutdown/exit ({len(init['result']['capabilities'])} capabilities)")
    return 0


if __name__ == "__main__":
    sys.exit(main())
