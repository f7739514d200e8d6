package org.qfleet.fit;

/** A fast two-argument arc tangent for the many phase steps of a sweep. */
final class Angles {

    /**
     * Minimax coefficients of arctan r on [0, 1], |error| below 2e-8 rad (Abramowitz and Stegun,
     * Handbook of Mathematical Functions, 4.4.49; recalled from memory and checked against
     * Math.atan2 in AnglesTest).
     */
    private static final double A2 = -0.3333314528;
    private static final double A4 = 0.1999355085;
    private static final double A6 = -0.1420889944;
    private static final double A8 = 0.1065626393;
    private static final double A10 = -0.0752896400;
    private static final double A12 = 0.0429096138;
    private static final double A14 = -0.0161657367;
    private static final double A16 = 0.0028662257;

    private Angles() {
    }

    /**
     * atan2(y, x) with an error below 1e-7 rad: the polynomial on the octant's ratio, the library
     * function for zeros, infinities and NaN.
     */
    static double atan2(double y, double x) {
        double ax = Math.abs(x);
        double ay = Math.abs(y);
        if (!(ax > 0 && ay > 0) || ax == Double.POSITIVE_INFINITY || ay == Double.POSITIVE_INFINITY) {
            return Math.atan2(y, x);
        }
        boolean steep = ay > ax;
        double r = steep ? ax / ay : ay / ax;
        double r2 = r * r;
        double a = r * (1 + r2 * (A2 + r2 * (A4 + r2 * (A6 + r2 * (A8 + r2 * (A10 + r2 * (A12 + r2 * (A14 + r2 * A16))))))));
        if (steep) {
            a = 0.5 * Math.PI - a;
        }
        if (x < 0) {
            a = Math.PI - a;
        }
        return y < 0 ? -a : a;
    }
}
