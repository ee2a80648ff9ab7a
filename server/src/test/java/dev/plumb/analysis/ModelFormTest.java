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
