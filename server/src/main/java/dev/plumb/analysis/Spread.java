package dev.plumb.analysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * How far a value may lie from its nominal value, from the tolerances of the inputs it depends on
 * and the stated accuracy of the correlations it uses, combined to first order: each source's
 * contribution is the value's derivative with respect to that source times the source's
 * tolerance, and the contributions add in quadrature, as for independent sources (JCGM 100:2008,
 * "Guide to the expression of uncertainty in measurement", eq. (10)). The tolerances are taken to
 * be all of one kind (all standard uncertainties, or all bounds at one confidence); the spread is
 * then of that kind too.
 *
 * @param si the combined spread in SI (never negative)
 * @param shares each source's contribution, largest first
 */
public record Spread(double si, List<Share> shares, Sampled sampled) {
    public Spread(double si, List<Share> shares) {
        this(si, shares, null);
    }

    public Spread {
        List<Share> sorted = new ArrayList<>(shares);
        sorted.sort(Comparator.comparingDouble((Share s) -> -Math.abs(s.si())));
        shares = List.copyOf(sorted);
    }

    /** What a source is: an input's written tolerance, or a correlation's stated accuracy. */
    public enum Kind { TOLERANCE, ACCURACY }

    /**
     * One source's contribution: {@code source} names it (the input, or the correlation and the
     * value it gives), {@code si} is the derivative times the source's tolerance, in SI.
     */
    public record Share(String source, Kind kind, double si) {
    }

    /**
     * A Monte Carlo estimate of the same spread: the inputs drawn from normal distributions whose
     * standard deviations are their tolerances (a correlation's accuracy likewise, on its value),
     * the calc evaluated for each draw; the mean and standard deviation of the value over the
     * {@code samples - failed} draws where it could be computed.
     */
    public record Sampled(double mean, double sd, int samples, int failed, long seed) {
    }

    /** This spread with a Monte Carlo estimate beside it. */
    Spread withSampled(Sampled s) {
        return new Spread(si, shares, s);
    }

    /** The part of the value's variance a share makes up (0 to 1): its square over the sum of squares. */
    public double fraction(Share s) {
        return si == 0 ? 0 : s.si() * s.si() / (si * si);
    }

    /** The combined spread of these contributions: the square root of the sum of their squares. */
    static Spread of(List<Share> shares) {
        double sum = 0;
        for (Share s : shares) sum += s.si() * s.si();
        return new Spread(Math.sqrt(sum), shares);
    }
}
