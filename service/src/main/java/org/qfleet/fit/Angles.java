package org.qfleet.fit;

/** A fast two-argument arc tangent for the many small phase steps of a sweep. */
final class Angles {

    private Angles() {
    }

    /**
     * atan2(y, x) with an error below 1e-7 rad: a short odd series where |y| is well below x (the
     * usual step between neighbouring points), the library function elsewhere.
     */
    static double atan2(double y, double x) {
        if (x > 0 && Math.abs(y) < 0.125 * x) {
            double r = y / x;
            double r2 = r * r;
            // atan r = r - r^3/3 + r^5/5 - r^7/7 + ..., truncated where |r| < 1/8 leaves under 1e-8.
            return r * (1 - r2 * (1.0 / 3 - r2 * (1.0 / 5 - r2 * (1.0 / 7))));
        }
        return Math.atan2(y, x);
    }
}
