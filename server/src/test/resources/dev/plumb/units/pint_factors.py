"""Reads "spelling<TAB>pint expression" lines on stdin and writes, for each, what the pint
units library makes of one and of zero of that unit in SI base units:

    spelling<TAB>si(0)<TAB>si(1)<TAB>L M T I Θ N J exponents

or "spelling<TAB>unknown<TAB>reason". Driven by PintCrossCheckTest; pint is the independent
reference, so nothing here may come from Plumb.
"""
import sys

import pint

BASES = ["[length]", "[mass]", "[time]", "[current]", "[temperature]", "[substance]",
         "[luminosity]"]


def si(ureg, expression, number):
    if expression.isidentifier():
        q = ureg.Quantity(number, expression)
    else:
        # A compound such as "force_pound / foot ** 2": multiplicative, so no offset.
        q = number * ureg.parse_expression(expression)
    return q.to_base_units()


def main():
    ureg = pint.UnitRegistry()
    for line in sys.stdin:
        line = line.rstrip("\n")
        if not line:
            continue
        spelling, expression = line.split("\t")
        try:
            zero = si(ureg, expression, 0)
            one = si(ureg, expression, 1)
        except Exception as e:  # pint says it does not know the unit
            print(spelling, "unknown", type(e).__name__ + ": " + str(e).replace("\t", " "),
                  sep="\t")
            continue
        dims = one.dimensionality
        exponents = " ".join(str(int(dims.get(b, 0))) for b in BASES)
        print(spelling, repr(float(zero.magnitude)), repr(float(one.magnitude)), exponents,
              sep="\t")
    sys.stdout.flush()


if __name__ == "__main__":
    main()
