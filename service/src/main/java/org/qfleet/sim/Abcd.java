package org.qfleet.sim;

/**
 * The chain (ABCD) matrix of a two-port: [V1; I1] = [A B; C D] [V2; I2], with I2 flowing out of
 * port 2. Element matrices and the conversion to S-parameters follow Pozar, Microwave Engineering,
 * 4th ed., tables 4.1 and 4.2 (recalled from memory).
 */
record Abcd(Complex a, Complex b, Complex c, Complex d) {

    /** An impedance in series with the signal path. */
    static Abcd series(Complex z) {
        return new Abcd(Complex.ONE, z, Complex.ZERO, Complex.ONE);
    }

    /** An admittance from the signal path to ground. */
    static Abcd shunt(Complex y) {
        return new Abcd(Complex.ONE, Complex.ZERO, y, Complex.ONE);
    }

    /** An ideal transformer with turns ratio n:1 (V1 = n V2, I1 = I2 / n). */
    static Abcd transformer(double n) {
        return new Abcd(Complex.real(n), Complex.ZERO, Complex.ZERO, Complex.real(1 / n));
    }

    /** This two-port followed by {@code next} (the matrix product). */
    Abcd then(Abcd next) {
        return new Abcd(
                a.times(next.a).plus(b.times(next.c)),
                a.times(next.b).plus(b.times(next.d)),
                c.times(next.a).plus(d.times(next.c)),
                c.times(next.b).plus(d.times(next.d)));
    }

    /** Input impedance at port 1 with port 2 left open (I2 = 0): A / C. */
    Complex inputImpedanceOpen() {
        return a.dividedBy(c);
    }

    /** The scattering matrix for reference impedance {@code z0} at both ports. */
    SMatrix toS(double z0) {
        Complex bn = b.times(1 / z0);
        Complex cn = c.times(z0);
        Complex den = a.plus(bn).plus(cn).plus(d);
        Complex s11 = a.plus(bn).minus(cn).minus(d).dividedBy(den);
        Complex s22 = d.plus(bn).minus(cn).minus(a).dividedBy(den);
        Complex s21 = Complex.real(2).dividedBy(den);
        Complex s12 = a.times(d).minus(b.times(c)).times(2).dividedBy(den);
        return new SMatrix(s11, s21, s12, s22);
    }
}
