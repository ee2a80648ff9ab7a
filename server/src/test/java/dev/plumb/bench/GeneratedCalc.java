package dev.plumb.bench;

/** A long, realistic calc document for robustness tests and benchmarks: many small drag cases. */
public final class GeneratedCalc {
    private GeneratedCalc() {
    }

    /** About {@code lines} lines: a header, then blocks of inputs, derived values and checks. */
    public static String of(int lines) {
        StringBuilder b = new StringBuilder(lines * 40);
        b.append("title \"Generated wind cases\"\n");
        b.append("input rho = 1.225 kg/m^3 \"air density\"\n");
        b.append("input mu = 1.81e-5 Pa*s \"air viscosity\"\n");
        b.append("drag(Cd, A, q) = Cd * A * q\n");
        int written = 4;
        for (int i = 0; written < lines; i++) {
            b.append("section \"Case ").append(i).append("\"\n");
            b.append("# Panel ").append(i).append(" on the east face.\n");
            b.append("input V_").append(i).append(" = ").append(20 + i % 17).append(" m/s \"gust\"\n");
            b.append("input b_").append(i).append(" = ").append(1 + i % 5).append(".5 m\n");
            b.append("A_").append(i).append(" = b_").append(i).append(" * 1.2 m   as frontal\n");
            b.append("q_").append(i).append(" = 0.5 * rho * V_").append(i).append("^2   in Pa\n");
            b.append("Re_").append(i).append(" = rho * V_").append(i).append(" * b_").append(i).append(" / mu\n");
            b.append("F_").append(i).append(" = drag(1.2, A_").append(i).append(", q_").append(i).append(")   in kN\n");
            b.append("check F_").append(i).append(" < 50 kN \"post capacity\"\n");
            b.append("check 1e4 < Re_").append(i).append(" < 1e8\n");
            written += 10;
        }
        return b.toString();
    }
}
