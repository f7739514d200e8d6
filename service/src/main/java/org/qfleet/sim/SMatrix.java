package org.qfleet.sim;

import org.qfleet.sweep.SParameter;

/** The four scattering parameters of a two-port at one frequency. */
record SMatrix(Complex s11, Complex s21, Complex s12, Complex s22) {

    /** A one-port: only S11 is meaningful, the rest are zero. */
    static SMatrix onePort(Complex s11) {
        return new SMatrix(s11, Complex.ZERO, Complex.ZERO, Complex.ZERO);
    }

    /** One-port reflection coefficient of an impedance, (Z - Z0) / (Z + Z0). */
    static SMatrix reflectionOf(Complex z, double z0) {
        Complex reference = Complex.real(z0);
        return onePort(z.minus(reference).dividedBy(z.plus(reference)));
    }

    Complex get(SParameter parameter) {
        return switch (parameter) {
            case S11 -> s11;
            case S21 -> s21;
            case S12 -> s12;
            case S22 -> s22;
        };
    }
}
