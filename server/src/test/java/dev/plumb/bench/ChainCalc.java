package dev.plumb.bench;

/**
 * The same generated calc written twice, as Plumb and as Python with the pint units library, for
 * the side-by-side benchmark: a chain of speeds, each made from the one before it (an edit at the
 * top changes every value below), and a drag figure after every ninth speed.
 */
public final class ChainCalc {
    private ChainCalc() {
    }

    /** One line of the chain: the {@code n}-th definition after the inputs, in Plumb or Python. */
    private static String line(int n, boolean python) {
        int speed = n - n / 10;
        if (n % 10 == 0) {
            return python ? "F_" + n + " = (1.2 * A * 0.5 * rho * V_" + speed + "**2).to(u.kN)\n"
                : "F_" + n + " = 1.2 * A * 0.5 * rho * V_" + speed + "^2 in kN\n";
        }
        return python ? "V_" + speed + " = V_" + (speed - 1) + " * 1.0001 + 0.001 * u.m / u.s\n"
            : "V_" + speed + " = V_" + (speed - 1) + " * 1.0001 + 0.001 m/s\n";
    }

    /** A Plumb calc of three inputs and {@code definitions} definitions, one per line. */
    public static String plumb(int definitions) {
        StringBuilder b = new StringBuilder(definitions * 40);
        b.append("title \"Generated chain\"\n");
        b.append("input V_0 = 20 m/s \"gust\"\n");
        b.append("input rho = 1.225 kg/m^3\n");
        b.append("input A = 1.5 m^2 as frontal\n");
        for (int n = 1; n <= definitions; n++) b.append(line(n, false));
        return b.toString();
    }

    /** The same calc as a Python cell that expects a pint registry named {@code u}. */
    public static String pythonCell(int definitions) {
        StringBuilder b = new StringBuilder(definitions * 50);
        b.append("V_0 = 20 * u.m / u.s\n");
        b.append("rho = 1.225 * u.kg / u.m**3\n");
        b.append("A = 1.5 * u.m**2\n");
        for (int n = 1; n <= definitions; n++) b.append(line(n, true));
        return b.toString();
    }

    /** The cell as a script run on its own: imports pint, makes the registry, prints the last speed. */
    public static String pythonScript(int definitions) {
        return "import pint\nu = pint.UnitRegistry()\n" + pythonCell(definitions) + "print(" + lastSpeed(definitions) + ")\n";
    }

    /** The name of the last speed of a chain of {@code definitions} definitions. */
    public static String lastSpeed(int definitions) {
        int n = definitions % 10 == 0 ? definitions - 1 : definitions;
        return "V_" + (n - n / 10);
    }
}
