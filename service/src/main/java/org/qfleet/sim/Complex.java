package org.qfleet.sim;

/** A complex number for the simulator's network algebra; immutable, allocation-light. */
record Complex(double re, double im) {

    static final Complex ZERO = new Complex(0, 0);
    static final Complex ONE = new Complex(1, 0);

    static Complex real(double re) {
        return new Complex(re, 0);
    }

    static Complex imaginary(double im) {
        return new Complex(0, im);
    }

    /** exp(j theta). */
    static Complex unit(double theta) {
        return new Complex(Math.cos(theta), Math.sin(theta));
    }

    Complex plus(Complex o) {
        return new Complex(re + o.re, im + o.im);
    }

    Complex minus(Complex o) {
        return new Complex(re - o.re, im - o.im);
    }

    Complex times(Complex o) {
        return new Complex(re * o.re - im * o.im, re * o.im + im * o.re);
    }

    Complex times(double k) {
        return new Complex(re * k, im * k);
    }

    Complex dividedBy(Complex o) {
        double den = o.re * o.re + o.im * o.im;
        return new Complex((re * o.re + im * o.im) / den, (im * o.re - re * o.im) / den);
    }

    Complex reciprocal() {
        double den = re * re + im * im;
        return new Complex(re / den, -im / den);
    }

    double abs() {
        return Math.hypot(re, im);
    }

    double arg() {
        return Math.atan2(im, re);
    }
}
