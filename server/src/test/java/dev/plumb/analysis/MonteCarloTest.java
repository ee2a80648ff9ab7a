package dev.plumb.analysis;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/**
 * The Monte Carlo estimate beside the first-order one. With normal draws of standard deviation
 * u, the sample standard deviation of N = 20,000 draws lies within a few per cent of the true one,
 * so the expectations below allow 4 % (about three standard errors for these distributions).
 */
class MonteCarloTest {
    private static Analysis analyse(String text, int samples) {
        Settings s = Settings.DEFAULT.withSamples(samples, Settings.DEFAULT_SEED);
        return new Workspace(new FileSources(), s).analyzeText(Path.of("mc.plumb").toAbsolutePath(), text);
    }

    private static Row.ValueRow row(Analysis a, String name) {
        return a.rows().stream().filter(r -> r instanceof Row.ValueRow v && v.name().equals(name)).map(r -> (Row.ValueRow) r)
            .findFirst().orElseThrow();
    }

    @Test
    void forSmallTolerancesTheSamplesAgreeWithTheFirstOrderEstimate() {
        // F = Cd·½ρV²·A with 1 % and 2 %: nearly linear over the spread, so both estimates agree.
        Analysis a = analyse("""
            input V = 20 m/s ± 1 %
            input Cd = 1.2 ± 2 %
            F = Cd * 0.5 * 1.2 kg/m^3 * V^2 * 0.5 m^2
            """, 20_000);
        Spread s = row(a, "F").spread();
        assertEquals(s.si(), s.sampled().sd(), 0.04 * s.si());
        assertEquals(row(a, "F").value().si(), s.sampled().mean(), 0.001 * row(a, "F").value().si());
        assertEquals(0, s.sampled().failed());
    }

    @Test
    void forAStronglyNonLinearValueTheSamplesSpreadWiderAndTheirMeanShifts() {
        // y = x² with x normal, mean 1, standard deviation 0.5. First order: u_y = 2·x·u_x = 1.
        // Exactly: E[y] = μ² + σ² = 1.25 and Var[y] = 4μ²σ² + 2σ⁴ = 1.125, so sd 1.0607: the
        // samples spread wider than the linear estimate and their mean lies above the nominal value.
        Analysis a = analyse("""
            input x = 1 ± 0.5
            y = x^2
            """, 20_000);
        Spread s = row(a, "y").spread();
        assertEquals(1.0, s.si(), 1e-6);
        assertEquals(Math.sqrt(1.125), s.sampled().sd(), 0.04 * Math.sqrt(1.125));
        assertTrue(s.sampled().sd() > s.si(), "wider than first order");
        assertEquals(1.25, s.sampled().mean(), 0.03);
        assertTrue(s.sampled().mean() > 1.0, "the mean shifts up");
    }

    @Test
    void theSameSeedGivesTheSameFigures() {
        String calc = "input x = 2 m ± 0.1 m\ny = x^3\n";
        assertEquals(row(analyse(calc, 500), "y").spread().sampled(), row(analyse(calc, 500), "y").spread().sampled());
    }

    @Test
    void drawsWhereAValueCannotBeComputedAreCountedAndToldOf() throws java.io.IOException {
        // z = sqrt(x) with x = 0.5 ± 0.5: x is negative in about 16 % of the normal draws (P(Z < -1)).
        Analysis a = analyse("""
            input x = 0.5 ± 0.5
            z = sqrt(x)
            """, 2_000);
        Spread.Sampled m = row(a, "z").spread().sampled();
        assertEquals(0.1587, m.failed() / 2000.0, 0.03);
        // The example of docs/diagnostics.md, with the message it quotes.
        assertEquals(java.util.List.of("z could not be computed in " + m.failed() + " of 2000 Monte Carlo samples (a draw "
            + "fell outside a formula's domain or a solve's bracket): its estimate is over the other " + (2000 - m.failed())
            + ", and says nothing of those draws"), a.diagnostics().stream()
            .filter(d -> d.code() == dev.plumb.diagnostics.Code.TOLERANCE_SAMPLES_FAILED).map(d -> d.message()).toList());
        String page = java.nio.file.Files.readString(dev.plumb.RepoRoot.get().resolve("docs/diagnostics.md"));
        assertTrue(page.contains("> z could not be computed in " + m.failed() + " of 2000 Monte Carlo samples"), "the page quotes it");
    }
}
