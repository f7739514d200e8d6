package org.qfleet.drift;

/**
 * Count, mean and sum of squared deviations of a sample, updated one value at a time by Welford's
 * method (Welford, Technometrics 4(3), 419, 1962), which stays accurate for large means such as f0
 * in hertz. A value can also be taken out again (a retest replaces a unit's earlier value), and two
 * samples can be combined or separated (Chan, Golub and LeVeque's pairwise formulas).
 */
public record Welford(long n, double mean, double m2) {

    public static final Welford EMPTY = new Welford(0, 0, 0);

    public Welford plus(double x) {
        long n1 = n + 1;
        double delta = x - mean;
        double mean1 = mean + delta / n1;
        return new Welford(n1, mean1, m2 + delta * (x - mean1));
    }

    public Welford minus(double x) {
        if (n <= 1) {
            return EMPTY;
        }
        long n1 = n - 1;
        double mean1 = (n * mean - x) / n1;
        return new Welford(n1, mean1, Math.max(0, m2 - (x - mean1) * (x - mean)));
    }

    public Welford combine(Welford other) {
        if (other.n == 0) {
            return this;
        }
        if (n == 0) {
            return other;
        }
        long total = n + other.n;
        double delta = other.mean - mean;
        return new Welford(total, mean + delta * other.n / total, m2 + other.m2 + delta * delta * n * other.n / total);
    }

    /** This sample without the values of {@code part}, which must be a subset of it. */
    public Welford without(Welford part) {
        if (part.n == 0) {
            return this;
        }
        long rest = n - part.n;
        if (rest <= 0) {
            return EMPTY;
        }
        double restMean = (n * mean - part.n * part.mean) / rest;
        double delta = part.mean - restMean;
        return new Welford(rest, restMean, Math.max(0, m2 - part.m2 - delta * delta * rest * part.n / n));
    }

    /** Sample variance (n - 1 in the denominator); NaN below two values. */
    public double variance() {
        return n < 2 ? Double.NaN : m2 / (n - 1);
    }

    public double standardDeviation() {
        return Math.sqrt(variance());
    }
}
