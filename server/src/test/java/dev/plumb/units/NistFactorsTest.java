package dev.plumb.units;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertInstanceOf;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;

/**
 * Every non-SI unit's factor to SI against NIST SP 811 (2008), "Guide for the Use of the
 * International System of Units (SI)", A. Thompson and B. N. Taylor, Appendix B.8 "Factors
 * for units listed alphabetically" and B.9 "Factors for units listed by kind of quantity".
 * No copy of the document was at hand: every figure below is from memory of those tables.
 *
 * <p>A figure NIST prints as exact is checked to double precision; a rounded figure is checked
 * to half a unit in its last printed digit, the precision NIST gives.
 */
class NistFactorsTest {

    private static final UnitRegistry UNITS = UnitRegistry.standard();

    // --- length ---

    @Test
    void foot() {
        exact("ft", "3.048 E-01"); // B.8 foot (ft) → meter (m), exact; from memory
    }

    @Test
    void inch() {
        exact("in", "2.54 E-02"); // B.8 inch (in) → meter (m), exact; from memory
    }

    @Test
    void yard() {
        exact("yd", "9.144 E-01"); // B.8 yard (yd) → meter (m), exact; from memory
    }

    @Test
    void mile() {
        exact("mi", "1.609 344 E+03"); // B.8 mile (mi) → meter (m), exact; from memory
    }

    @Test
    void nauticalMile() {
        exact("nmi", "1.852 E+03"); // B.8 mile, nautical → meter (m), exact; from memory
    }

    // --- velocity ---

    @Test
    void milePerHour() {
        exact("mph", "4.4704 E-01"); // B.8 mile per hour (mi/h) → m/s, exact; from memory
    }

    @Test
    void knot() {
        rounded("kn", "5.144 444 E-01"); // B.8 knot (nautical mile per hour) → m/s; from memory
    }

    @Test
    void knotSpelledOut() {
        rounded("knot", "5.144 444 E-01"); // B.8 knot → m/s; from memory
    }

    // --- mass and force ---

    @Test
    void poundMass() {
        exact("lbm", "4.535 923 7 E-01"); // B.8 pound (avoirdupois) (lb) → kg, exact; from memory
    }

    @Test
    void pound() {
        exact("lb", "4.535 923 7 E-01"); // B.8 pound (avoirdupois) (lb) → kg, exact; from memory
    }

    @Test
    void slug() {
        rounded("slug", "1.459 390 E+01"); // B.8 slug (slug) → kilogram (kg); from memory
    }

    @Test
    void poundForce() {
        rounded("lbf", "4.448 222 E+00"); // B.8 pound-force (lbf) → newton (N); from memory
    }

    @Test
    void kilogramForce() {
        exact("kgf", "9.806 65 E+00"); // B.8 kilogram-force (kgf) → newton (N), exact; from memory
    }

    // --- pressure ---

    @Test
    void psi() {
        rounded("psi", "6.894 757 E+03"); // B.8 psi (pound-force per square inch) → Pa; from memory
    }

    @Test
    void psiWrittenOut() {
        rounded("lbf/in^2", "6.894 757 E+03"); // B.8 pound-force per square inch → Pa; from memory
    }

    @Test
    void standardAtmosphere() {
        exact("atm", "1.013 25 E+05"); // B.8 atmosphere, standard (atm) → Pa, exact; from memory
    }

    @Test
    void bar() {
        exact("bar", "1.0 E+05"); // B.8 bar (bar) → pascal (Pa), exact; from memory
    }

    @Test
    void ounce() {
        rounded("oz", "2.834 952 E-02"); // B.8 ounce (avoirdupois) (oz) → kg; from memory
    }

    @Test
    void shortTon() {
        rounded("ton", "9.071 847 E+02"); // B.8 ton, short (2000 lb) → kg; from memory
        exact("ton", "9.071 847 4 E+02"); // by hand: 2000 × 0.453 592 37 kg = 907.184 74 kg
    }

    @Test
    void tonne() {
        exact("t", "1.0 E+03"); // B.8 ton, metric (t) → kilogram (kg), exact; from memory
    }

    @Test
    void kip() {
        rounded("kip", "4.448 222 E+03"); // B.8 kip (1 kip = 1000 lbf) → newton (N); from memory
        rounded("kipf", "4.448 222 E+03"); // B.8 kip → N; from memory
        // by hand: 1000 × 0.453 592 37 kg × 9.806 65 m/s² = 4448.221 615 260 5 N
        exact("kip", "4.448 221 615 260 5 E+03");
    }

    @Test
    void dyne() {
        exact("dyn", "1.0 E-05"); // B.8 dyne (dyn) → newton (N), exact; from memory
    }

    @Test
    void poundForcePerFoot() {
        rounded("plf", "1.459 390 E+01"); // B.8 pound-force per foot (lbf/ft) → N/m; from memory
    }

    @Test
    void kipPerFoot() {
        // by hand: 1000 × B.8 pound-force per foot (lbf/ft) → N/m 1.459 390 E+01; from memory
        rounded("klf", "1.459 390 E+04");
    }

    @Test
    void psiAbsolute() {
        rounded("psia", "6.894 757 E+03"); // B.8 psi (pound-force per square inch) → Pa; from memory
    }

    @Test
    void kipPerSquareInch() {
        rounded("ksi", "6.894 757 E+06"); // B.8 kip per square inch (ksi) → Pa; from memory
    }

    @Test
    void poundForcePerSquareFoot() {
        rounded("psf", "4.788 026 E+01"); // B.8 pound-force per square foot (lbf/ft²) → Pa; from memory
        rounded("lbf/ft^2", "4.788 026 E+01"); // the same, written out
    }

    @Test
    void kipPerSquareFoot() {
        // by hand: 1000 × B.8 pound-force per square foot (lbf/ft²) → Pa 4.788 026 E+01; from memory
        rounded("ksf", "4.788 026 E+04");
    }

    @Test
    void torr() {
        rounded("Torr", "1.333 224 E+02"); // B.8 torr (Torr) → pascal (Pa); from memory
        rounded("torr", "1.333 224 E+02"); // B.8 torr → Pa; from memory
    }

    @Test
    void mercuryColumns() {
        // B.8 millimeter of mercury, conventional (mmHg) → Pa; from memory
        rounded("mmHg", "1.333 224 E+02");
        // B.8 inch of mercury, conventional (inHg) → Pa; from memory
        rounded("inHg", "3.386 389 E+03");
    }

    @Test
    void waterColumns() {
        // B.8 millimeter of water, conventional (mmH2O) → Pa, exact; from memory
        exact("mmH2O", "9.806 65 E+00");
        // B.8 inch of water, conventional (inH2O) → Pa; from memory
        rounded("inH2O", "2.490 889 E+02");
        // B.8 foot of water, conventional (ftH2O) → Pa; from memory
        rounded("ftH2O", "2.989 067 E+03");
    }

    // --- power ---

    @Test
    void horsepower() {
        // B.8 horsepower (550 ft·lbf/s) → watt (W) 7.456 999 E+02; from memory. The library's
        // horsepower is this mechanical one, not the electric (746 W) or metric one.
        rounded("hp", "7.456 999 E+02");
    }

    // --- energy ---

    @Test
    void britishThermalUnit() {
        // B.8 British thermal unit_IT (Btu_IT) → joule (J); from memory
        rounded("BTU", "1.055 056 E+03");
        rounded("Btu", "1.055 056 E+03");
    }

    @Test
    void kilocalorie() {
        exact("kcal", "4.1868 E+03"); // B.8 kilocalorie_IT (kcal_IT) → joule (J), exact; from memory
    }

    @Test
    void wattHour() {
        exact("Wh", "3.6 E+03"); // B.8 watt hour (W · h) → joule (J), exact; from memory
        exact("kWh", "3.6 E+06"); // B.8 kilowatt hour (kW · h) → joule (J), exact; from memory
        exact("MWh", "3.6 E+09"); // by hand: 1000 × 3.6 E+06 J
    }

    // --- viscosity ---

    @Test
    void centipoise() {
        exact("cP", "1.0 E-03"); // B.8 centipoise (cP) → pascal second (Pa·s), exact; from memory
    }

    @Test
    void poise() {
        exact("P", "1.0 E-01"); // B.8 poise (P) → pascal second (Pa·s), exact; from memory
    }

    @Test
    void stokes() {
        exact("St", "1.0 E-04"); // B.8 stokes (St) → m²/s, exact; from memory
    }

    @Test
    void centistokes() {
        exact("cSt", "1.0 E-06"); // B.8 centistokes (cSt) → m²/s, exact; from memory
    }

    // --- volume, time, angle ---

    @Test
    void litre() {
        exact("L", "1.0 E-03"); // B.8 liter (L) → cubic meter (m³), exact; from memory
    }

    @Test
    void minuteHourDay() {
        exact("min", "6.0 E+01"); // B.8 minute (min) → second (s), exact; from memory
        exact("h", "3.6 E+03"); // B.8 hour (h) → second (s), exact; from memory
        exact("d", "8.64 E+04"); // B.8 day (d) → second (s), exact; from memory
    }

    @Test
    void usGallon() {
        rounded("gal", "3.785 412 E-03"); // B.8 gallon [U.S.] (gal) → cubic meter (m³); from memory
        exact("gal", "3.785 411 784 E-03"); // by hand: 231 in³ × (0.0254 m/in)³
    }

    @Test
    void flowRates() {
        // B.8 gallon [U.S.] per minute (gpm) (gal/min) → m³/s; from memory
        rounded("gpm", "6.309 020 E-05");
        // B.8 cubic foot per minute (ft³/min) → m³/s; from memory
        rounded("cfm", "4.719 474 E-04");
        // B.8 cubic foot per second (ft³/s) → m³/s; from memory
        rounded("cfs", "2.831 685 E-02");
    }

    @Test
    void dayWrittenOut() {
        exact("day", "8.64 E+04"); // B.8 day (d) → second (s), exact; from memory
    }

    @Test
    void julianYear() {
        // by hand: 365.25 d × 8.64 E+04 s/d (B.8 day, exact; from memory) = 31 557 600 s. NIST
        // B.8's year (365 days) is 3.1536 E+07 s; Plumb's yr is the Julian year, on purpose.
        exact("yr", "3.155 76 E+07");
    }

    @Test
    void revolutionPerMinute() {
        // B.8 revolution per minute (rpm) (r/min) → radian per second (rad/s); from memory
        rounded("rpm", "1.047 198 E-01");
    }

    @Test
    void angleDegree() {
        rounded("deg", "1.745 329 E-02"); // B.8 degree (°) → radian (rad); from memory
    }

    // --- temperature (B.8 and B.9 "Temperature", from memory) ---

    @Test
    void fahrenheitAsPoint() {
        // B.9: T/K = (t/°F + 459.67)/1.8, so 68 °F is 293.15 K; from memory.
        assertEquals(293.15, unit("degF").toSi(68), 1e-9);
    }

    @Test
    void fahrenheitAsDifferenceInCompound() {
        // B.8 degree Fahrenheit (temperature interval) → kelvin 5.555 556 E-01; from memory.
        // Per degree Fahrenheit is then 1.8 per kelvin.
        Unit perDegree = unit("J/(kg*degF)");
        assertEquals(0, perDegree.offset());
        assertEquals(1.8, perDegree.factor(), 1e-15);
    }

    @Test
    void fahrenheitIntervalFactor() {
        rounded("degF^1", "5.555 556 E-01"); // B.8 °F interval → K; from memory
    }

    @Test
    void celsiusAsPoint() {
        // B.9: T/K = t/°C + 273.15, so 15 °C is 288.15 K; from memory.
        assertEquals(288.15, unit("degC").toSi(15), 1e-12);
    }

    @Test
    void celsiusAsDifferenceInCompound() {
        // B.8 degree Celsius (temperature interval) → kelvin 1.0 E+00, exact; from memory.
        Unit perDegree = unit("W/(m*°C)");
        assertEquals(0, perDegree.offset());
        assertEquals(1.0, perDegree.factor(), 0);
    }

    @Test
    void rankine() {
        // B.9: T/K = (T/°R)/1.8, so 527.67 °R is 293.15 K; from memory.
        assertEquals(293.15, unit("degR").toSi(527.67), 1e-9);
    }

    /** A figure NIST prints as exact ("3.048 E-01"): equal to double precision. */
    private static void exact(String expression, String nist) {
        double expected = parse(nist).doubleValue();
        assertEquals(expected, unit(expression).factor(), Math.ulp(expected) * 2, expression);
    }

    /** A rounded figure: equal to half a unit in the last digit NIST prints. */
    private static void rounded(String expression, String nist) {
        BigDecimal figure = parse(nist);
        double halfLastDigit = BigDecimal.ONE.movePointLeft(figure.scale()).doubleValue() / 2;
        assertEquals(figure.doubleValue(), unit(expression).factor(), halfLastDigit, expression);
    }

    /** NIST's spaced notation "1.459 390 E+01" as a decimal keeping its printed digits. */
    private static BigDecimal parse(String nist) {
        String[] parts = nist.replace(" E", "E").replace(" ", "").split("E");
        return new BigDecimal(parts[0]).scaleByPowerOfTen(Integer.parseInt(parts[1]));
    }

    private static Unit unit(String expression) {
        UnitResult result = UNITS.resolve(expression);
        return assertInstanceOf(UnitResult.Ok.class, result, expression).unit();
    }
}
