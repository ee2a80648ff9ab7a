package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * Model-form uncertainty: the other entries of a family valid at the call, evaluated there. The
 * expected values are the published forms of the sphere-drag fits at Re = 500.
 */
class ModelFormTest {
    @Test
    void everyValidEntryOfTheFamilyIsEvaluatedAtTheCall() {
        Analysis a = Fixture.analyze("Cd = cd_sphere_sn(500)\nCd_stokes = cd_sphere_stokes(0.05)\n");
        ModelForm m = Fixture.value(a, "Cd").modelForm();
        double re = 500;
        // Schiller and Naumann (1933): 24/Re (1 + 0.15 Re^0.687).
        double sn = 24 / re * (1 + 0.15 * Math.pow(re, 0.687));
        // Clift and Gauvin (1970): Schiller–Naumann + 0.42 / (1 + 4.25e4 Re^-1.16).
        double cg = sn + 0.42 / (1 + 4.25e4 * Math.pow(re, -1.16));
        // Brown and Lawler (2003), eq. (19): 24/Re (1 + 0.150 Re^0.681) + 0.407 / (1 + 8710/Re).
        double bl = 24 / re * (1 + 0.150 * Math.pow(re, 0.681)) + 0.407 / (1 + 8710 / re);
        // Morrison (2013): 24/Re + 2.6 (Re/5)/(1 + (Re/5)^1.52) + 0.411 (Re/2.63e5)^-7.94/(1 + (Re/2.63e5)^-8) + 0.25 (Re/1e6)/(1 + Re/1e6).
        double mo = 24 / re + 2.6 * (re / 5) / (1 + Math.pow(re / 5, 1.52))
            + 0.411 * Math.pow(re / 2.63e5, -7.94) / (1 + Math.pow(re / 2.63e5, -8.0)) + 0.25 * (re / 1e6) / (1 + re / 1e6);
        assertEquals("cd_sphere_sn", m.entries().get(0).name(), "the entry called comes first");
        List<String> names = m.entries().stream().map(ModelForm.Entry::name).toList();
        assertEquals(List.of("cd_sphere_sn", "cd_sphere_clift_gauvin", "cd_sphere_brown_lawler", "cd_sphere_morrison",
            "cd_sphere"), names);
        double low = Math.min(Math.min(sn, cg), Math.min(bl, mo));
        double high = Math.max(Math.max(sn, cg), Math.max(bl, mo));
        assertEquals(low, m.low(), 1e-12);
        assertEquals(high, m.high(), 1e-12);
        // At Re = 0.05 the Stokes law is valid, and so are the others reaching down to 0: a range again.
        assertEquals("cd_sphere_stokes", Fixture.value(a, "Cd_stokes").modelForm().entries().get(0).name());
    }

    @Test
    void theChoiceIsCarriedToTheValuesComputedFromIt() {
        // A float of our own. F = Cd · A · q is linear in Cd, so F with each entry in place of the one called
        // is F · Cd_entry / Cd, and P = F · V likewise; the range of F is [F·low/Cd, F·high/Cd].
        // The hull friction is a second choice (the plate-friction family) reaching F_total only, with the
        // narrower relative range there: F_total keeps the widest and counts the other.
        Analysis a = Fixture.analyze("""
            input d = 0.2 m
            input V = 3 m/s
            Re = 1.2 kg/m^3 * V * d / 1.8e-5 Pa*s
            Cd = cd_sphere(Re)
            A = pi * d^2 / 4 as frontal
            F = Cd * A * 0.5 * 1.2 kg/m^3 * V^2 in N
            P = F * V in W
            Re_h = V * 1.5 m / 1.0e-6 m^2/s
            Cf = cf_plate_turb_avg(Re_h)
            S = 0.6 m^2 as wetted
            D_f = Cf * S * 0.5 * 1000 kg/m^3 * V^2 in N
            F_total = F + D_f in N
            """);
        ModelForm cd = Fixture.value(a, "Cd").modelForm();
        Row.ValueRow f = Fixture.value(a, "F");
        ModelForm m = f.modelForm();
        assertEquals("Cd", m.through());
        assertEquals(cd.entries().size(), m.entries().size());
        double ratio = f.value().si() / Fixture.value(a, "Cd").value().si();
        for (int i = 0; i < cd.entries().size(); i++) {
            assertEquals(cd.entries().get(i).name(), m.entries().get(i).name());
            assertEquals(cd.entries().get(i).si() * ratio, m.entries().get(i).si(), 1e-12 * f.value().si());
        }
        assertEquals(cd.low() * ratio, m.low(), 1e-12 * f.value().si());
        assertEquals(cd.high() * ratio, m.high(), 1e-12 * f.value().si());
        assertEquals(0, m.others());
        ModelForm p = Fixture.value(a, "P").modelForm();
        assertEquals(cd.high() * ratio * 3, p.high(), 1e-12 * Fixture.value(a, "P").value().si());
        assertNull(Fixture.value(a, "Re").modelForm(), "nothing upstream of the call carries it");

        // F_total = F + D_f, both choices reach it: through Cd, F_total ranges over F·Cd_i/Cd + D_f; through Cf,
        // over F + D_f·Cf_j/Cf. It keeps the wider of the two and counts the other.
        ModelForm cf = Fixture.value(a, "Cf").modelForm();
        double fv = f.value().si();
        double df = Fixture.value(a, "D_f").value().si();
        double cfv = Fixture.value(a, "Cf").value().si();
        double widthCd = (cd.high() - cd.low()) * ratio;
        double widthCf = (cf.high() - cf.low()) * df / cfv;
        ModelForm total = Fixture.value(a, "F_total").modelForm();
        assertEquals(widthCd > widthCf ? "Cd" : "Cf", total.through());
        assertEquals(Math.max(widthCd, widthCf), total.high() - total.low(), 1e-9 * (fv + df));
        assertEquals(1, total.others());
    }

    @Test
    void aCorrelationWithoutAFamilyHasNone() {
        Analysis a = Fixture.analyze("""
            correlation cd_strut(Re)
                valid 1e4 <= Re <= 2e5
                = 0.12
            end
            Cd = cd_strut(5e4)
            """);
        assertNull(Fixture.value(a, "Cd").modelForm());
    }
}
