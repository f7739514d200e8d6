package org.qfleet.app.plot;

/** A circle in the complex plane, as drawn for a fitted resonance. */
record Circle(double centerRe, double centerIm, double radius) {

    /** The circle through three points, or null when they (nearly) lie on one line. */
    static Circle through(double x1, double y1, double x2, double y2, double x3, double y3) {
        // Circumcentre from the perpendicular bisectors (elementary geometry).
        double d = 2 * (x1 * (y2 - y3) + x2 * (y3 - y1) + x3 * (y1 - y2));
        double scale = Math.max(Math.max(Math.hypot(x2 - x1, y2 - y1), Math.hypot(x3 - x1, y3 - y1)), 1e-300);
        if (!(Math.abs(d) > 1e-9 * scale * scale)) {
            return null;
        }
        double s1 = x1 * x1 + y1 * y1;
        double s2 = x2 * x2 + y2 * y2;
        double s3 = x3 * x3 + y3 * y3;
        double cx = (s1 * (y2 - y3) + s2 * (y3 - y1) + s3 * (y1 - y2)) / d;
        double cy = (s1 * (x3 - x2) + s2 * (x1 - x3) + s3 * (x2 - x1)) / d;
        Circle c = new Circle(cx, cy, Math.hypot(x1 - cx, y1 - cy));
        return Double.isFinite(c.radius) ? c : null;
    }
}
