package org.qfleet.fit;

/**
 * Least squares of the resonance circle with delay on normalized frequency x = (f - fRef) / scale:
 * exp(-j t x) exp(s x) (B + A g / (g + j (x - x0))).
 * Parameters: [br, bi, ar, ai, x0, g, t] with background, [ar, ai, x0, g, t] without, and s appended
 * when a magnitude tilt is fitted; g is the half width and t = 2 pi tau scale. A real tilt and a
 * delay act on the background in quadrature, so both can be told apart when the background is large
 * (notch, reflection). The model is written in the frame rotated back by the delay, where the
 * rotation cancels from J^T J (|exp(-j t x)| = 1).
 */
final class CircleProblem implements LeastSquaresProblem {

    private final double[] x;
    private final double[] zr;
    private final double[] zi;
    private final boolean background;
    private final boolean tilt;
    private final boolean equallySpaced;
    private final double[] cos;
    private final double[] sin;
    private final double[] gain;
    private final double[][] scoreJtj = new double[7][7];
    private final double[] scoreJtr = new double[7];
    private final double[] scoredAt = new double[5];

    CircleProblem(double[] x, double[] zr, double[] zi, boolean background, boolean tilt) {
        this.x = x;
        this.zr = zr;
        this.zi = zi;
        this.background = background;
        this.tilt = tilt;
        this.equallySpaced = Phasors.equallySpaced(x);
        java.util.Arrays.fill(scoredAt, Double.NaN);
        this.gain = new double[x.length];
        this.cos = new double[x.length];
        this.sin = new double[x.length];
    }

    boolean background() {
        return background;
    }

    boolean tilt() {
        return tilt;
    }

    @Override
    public int parameterCount() {
        return (background ? 7 : 5) + (tilt ? 1 : 0);
    }

    @Override
    public int residualCount() {
        return 2 * x.length;
    }

    @Override
    public double cost(double[] p) {
        return normalEquations(p, null, null);
    }

    @Override
    public double normalEquations(double[] p, double[][] jtj, double[] jtr) {
        if (jtj == null) {
            return costOnly(p);
        }
        if (!background) {
            return plainKernel(p, jtj, jtr);
        }
        return tilt ? tiltKernel(p, jtj, jtr) : backgroundWithoutTilt(p, jtj, jtr);
    }

    /** The background model is the tilted one with the tilt held at zero: its leading 7 x 7 block. */
    private double backgroundWithoutTilt(double[] p, double[][] jtj, double[] jtr) {
        double[] p8 = java.util.Arrays.copyOf(p, 8);
        double[][] jtj8 = new double[8][8];
        double[] jtr8 = new double[8];
        double cost = tiltKernel(p8, jtj8, jtr8);
        for (int i = 0; i < 7; i++) {
            System.arraycopy(jtj8[i], i, jtj[i], i, 7 - i);
            jtr[i] = jtr8[i];
        }
        return cost;
    }

    private double costOnly(double[] p) {
        return residuals(p, null);
    }

    /** |r|^2 at every point for parameters p, for the residual checks. */
    double[] residualPower(double[] p) {
        double[] out = new double[x.length];
        residuals(p, out);
        return out;
    }

    /** The sum of |r|^2, and each term into {@code out} when it is not null. */
    private double residuals(double[] p, double[] out) {
        int o = background ? 2 : 0;
        double br = background ? p[0] : 0;
        double bi = background ? p[1] : 0;
        double ar = p[o];
        double ai = p[o + 1];
        double x0 = p[o + 2];
        double g = p[o + 3];
        double slope = tilt ? p[o + 5] : 0;
        Phasors.fill(p[o + 4], x, equallySpaced, cos, sin);
        Phasors.fillGain(slope, x, equallySpaced, gain);
        double g2 = g * g;
        double cost = 0;
        for (int k = 0; k < x.length; k++) {
            double wr = cos[k] * zr[k] + sin[k] * zi[k];
            double wi = cos[k] * zi[k] - sin[k] * zr[k];
            double u = x[k] - x0;
            double dd = 1 / (g2 + u * u);
            double lr = g2 * dd;
            double li = -g * u * dd;
            double k1 = gain[k];
            double rr = wr - k1 * (br + ar * lr - ai * li);
            double ri = wi - k1 * (bi + ar * li + ai * lr);
            double r2 = rr * rr + ri * ri;
            cost += r2;
            if (out != null) {
                out[k] = r2;
            }
        }
        return cost;
    }


    private double plainKernel(double[] p, double[][] jtj, double[] jtr) {
        double cost = plainWithBackgroundScore(p, jtj, jtr, scoreJtj, scoreJtr);
        System.arraycopy(p, 0, scoredAt, 0, 5);
        return cost;
    }

    /**
     * The normal equations of the model with a background at B = 0 and the other parameters at
     * {@code p5}, reusing the last pass when it was made at the same point.
     */
    void backgroundScoreEquations(double[] p5, double[][] jtj7, double[] jtr7) {
        if (!java.util.Arrays.equals(p5, 0, 5, scoredAt, 0, 5)) {
            plainKernel(p5, new double[5][5], new double[5]);
        }
        for (int i = 0; i < 7; i++) {
            System.arraycopy(scoreJtj[i], 0, jtj7[i], 0, 7);
        }
        System.arraycopy(scoreJtr, 0, jtr7, 0, 7);
    }

    /**
     * Normal equations of the background-free model, and optionally those of the model with a
     * background evaluated at B = 0 (for the score test of the background), in one pass. With
     * D = g + j u, L = g / D, M = A L and r the residual, every entry reduces to a handful of sums
     * over the points: geometric ones (powers of u and x over |D|^2 and |D|^4) and the projections
     * of r on conj(L), conj(1/D^2), u conj(1/D^2) and x conj(L). Parameters [ar, ai, x0, g, t];
     * the extension orders them [br, bi, ar, ai, x0, g, t].
     */
    double plainWithBackgroundScore(double[] p, double[][] jtj, double[] jtr, double[][] jtj7, double[] jtr7) {
        double ar = p[0];
        double ai = p[1];
        double x0 = p[2];
        double g = p[3];
        Phasors.fill(p[4], x, equallySpaced, cos, sin);
        double g2 = g * g;
        double cost = 0;
        double s0 = 0, v1 = 0, t0 = 0, t1 = 0, t2 = 0, w3 = 0, u1 = 0, u2 = 0, u3 = 0, u4 = 0, u5 = 0;
        double c0r = 0, c0i = 0, c1r = 0, c1i = 0, c2r = 0, c2i = 0, c3r = 0, c3i = 0, c4r = 0, c4i = 0;
        for (int k = 0; k < x.length; k++) {
            double c = cos[k];
            double s = sin[k];
            double xk = x[k];
            double wr = c * zr[k] + s * zi[k];
            double wi = c * zi[k] - s * zr[k];
            double u = xk - x0;
            double iq = 1 / (g2 + u * u);
            double iq2 = iq * iq;
            double lr = g2 * iq;
            double li = -g * u * iq;
            double rr = wr - (ar * lr - ai * li);
            double ri = wi - (ar * li + ai * lr);
            cost += rr * rr + ri * ri;
            s0 += iq;
            v1 += u * iq;
            t0 += iq2;
            double uiq2 = u * iq2;
            t1 += uiq2;
            t2 += u * uiq2;
            w3 += u * u * uiq2;
            u1 += xk * iq;
            u2 += xk * iq2;
            u3 += xk * uiq2;
            u4 += xk * xk * iq;
            u5 += xk * u * iq;
            c0r += rr;
            c0i += ri;
            // conj(L) r = (lr - j li) r
            double pr = lr * rr + li * ri;
            double pi = lr * ri - li * rr;
            c1r += pr;
            c1i += pi;
            c4r += xk * pr;
            c4i += xk * pi;
            // conj(1/D^2) r = ((g^2 - u^2) + 2 j g u) / |D|^4 r
            double er = (g2 - u * u) * iq2;
            double ei = 2 * g * u * iq2;
            double qr = er * rr - ei * ri;
            double qi = er * ri + ei * rr;
            c2r += qr;
            c2i += qi;
            c3r += u * qr;
            c3i += u * qi;
        }
        double a2 = ar * ar + ai * ai;
        // K1 = sum (g - j u) / |D|^4, Kg = sum u (g - j u) / |D|^4.
        double k1r = g * t0;
        double k1i = -t1;
        double kgr = g * t1;
        double kgi = -t2;
        double[] e = new double[15];
        e[0] = g2 * s0;                                   // ar ar
        e[1] = 0;                                         // ar ai
        e[2] = -g2 * (ar * k1i + ai * k1r);               // ar x0: Re(j g^2 A K1)
        e[3] = -g * (ar * kgi + ai * kgr);                // ar g:  Re(j g A Kg)
        e[4] = g2 * u1 * ai;                              // ar t
        e[5] = g2 * s0;                                   // ai ai
        e[6] = g2 * (ar * k1r - ai * k1i);                // ai x0: Re(g^2 A K1)
        e[7] = g * (ar * kgr - ai * kgi);                 // ai g:  Re(g A Kg)
        e[8] = -g2 * u1 * ar;                             // ai t
        e[9] = g2 * a2 * t0;                              // x0 x0
        e[10] = g * a2 * t1;                              // x0 g
        e[11] = -g2 * g * a2 * u2;                        // x0 t
        e[12] = a2 * t2;                                  // g g
        e[13] = -g2 * a2 * u3;                            // g t
        e[14] = a2 * g2 * u4;                             // t t
        double[] v = {
            c1r,
            c1i,
            g * (ar * c2i - ai * c2r),                    // g Im(conj(A) C2)
            ar * c3i - ai * c3r,                          // Im(conj(A) C3)
            -(ar * c4i - ai * c4r)                        // -Im(conj(A) C4)
        };
        int idx = 0;
        for (int i = 0; i < 5; i++) {
            jtr[i] = v[i];
            for (int j = i; j < 5; j++) {
                jtj[i][j] = e[idx++];
            }
        }
        if (jtj7 != null) {
            idx = 0;
            for (int i = 0; i < 5; i++) {
                jtr7[i + 2] = v[i];
                for (int j = i; j < 5; j++) {
                    jtj7[i + 2][j + 2] = e[idx++];
                }
            }
            int n = x.length;
            // sum 1/D^2 = g^2 T0 - T2 - 2 j g T1; sum u/D^2 = g^2 T1 - W3 - 2 j g T2; sum x L = g^2 U1 - j g U5.
            double p1r = g2 * t0 - t2;
            double p1i = -2 * g * t1;
            double p2r = g2 * t1 - w3;
            double p2i = -2 * g * t2;
            double p3r = g2 * u1;
            double p3i = -g * u5;
            jtj7[0][0] = n;
            jtj7[0][1] = 0;
            jtj7[1][1] = n;
            jtj7[0][2] = g2 * s0;
            jtj7[0][3] = g * v1;
            jtj7[1][2] = -g * v1;
            jtj7[1][3] = g2 * s0;
            jtj7[0][4] = -g * (ar * p1i + ai * p1r);      // Re(j g A P1)
            jtj7[1][4] = g * (ar * p1r - ai * p1i);       // Re(g A P1)
            jtj7[0][5] = -(ar * p2i + ai * p2r);          // Re(j A P2)
            jtj7[1][5] = ar * p2r - ai * p2i;             // Re(A P2)
            jtj7[0][6] = ar * p3i + ai * p3r;             // Re(-j A P3)
            jtj7[1][6] = -(ar * p3r - ai * p3i);          // -Re(A P3)
            jtr7[0] = c0r;
            jtr7[1] = c0i;
        }
        return cost;
    }

    /** Unrolled accumulation for 8 parameters (br, bi, ar, ai, x0, g, t, s). */
    private double tiltKernel(double[] p, double[][] jtj, double[] jtr) {
        double br = p[0];
        double bi = p[1];
        double ar = p[2];
        double ai = p[3];
        double x0 = p[4];
        double g = p[5];
        double t = p[6];
        double slope = p[7];
        Phasors.fill(t, x, equallySpaced, cos, sin);
        Phasors.fillGain(slope, x, equallySpaced, gain);
        double g2 = g * g;
        double cost = 0;
        double a00 = 0;
        double a01 = 0;
        double a02 = 0;
        double a03 = 0;
        double a04 = 0;
        double a05 = 0;
        double a06 = 0;
        double a07 = 0;
        double a11 = 0;
        double a12 = 0;
        double a13 = 0;
        double a14 = 0;
        double a15 = 0;
        double a16 = 0;
        double a17 = 0;
        double a22 = 0;
        double a23 = 0;
        double a24 = 0;
        double a25 = 0;
        double a26 = 0;
        double a27 = 0;
        double a33 = 0;
        double a34 = 0;
        double a35 = 0;
        double a36 = 0;
        double a37 = 0;
        double a44 = 0;
        double a45 = 0;
        double a46 = 0;
        double a47 = 0;
        double a55 = 0;
        double a56 = 0;
        double a57 = 0;
        double a66 = 0;
        double a67 = 0;
        double a77 = 0;
        double v0 = 0;
        double v1 = 0;
        double v2 = 0;
        double v3 = 0;
        double v4 = 0;
        double v5 = 0;
        double v6 = 0;
        double v7 = 0;
        for (int k = 0; k < x.length; k++) {
            double c = cos[k];
            double s = sin[k];
            double xk = x[k];
            double wr = c * zr[k] + s * zi[k];
            double wi = c * zi[k] - s * zr[k];
            double u = xk - x0;
            double dd = 1 / (g2 + u * u);
            double lr = g2 * dd;
            double li = -g * u * dd;
            double br0 = br + ar * lr - ai * li;
            double bi0 = bi + ar * li + ai * lr;
            double k1 = gain[k];
            double mr = k1 * br0;
            double mi = k1 * bi0;
            double rr = wr - mr;
            double ri = wi - mi;
            cost += rr * rr + ri * ri;
            double dd2 = dd * dd;
            double qr0 = (g2 - u * u) * dd2;
            double qi0 = -2 * g * u * dd2;
            double qr = k1 * (ar * qr0 - ai * qi0);
            double qi = k1 * (ar * qi0 + ai * qr0);
            double r0 = k1;
            double i0 = 0;
            double r1 = 0;
            double i1 = k1;
            double r2 = k1 * lr;
            double i2 = k1 * li;
            double r3 = -k1 * li;
            double i3 = k1 * lr;
            double r4 = -g * qi;
            double i4 = g * qr;
            double r5 = -u * qi;
            double i5 = u * qr;
            double r6 = xk * mi;
            double i6 = -xk * mr;
            double r7 = xk * mr;
            double i7 = xk * mi;
            v0 += r0 * rr + i0 * ri;
            v1 += r1 * rr + i1 * ri;
            v2 += r2 * rr + i2 * ri;
            v3 += r3 * rr + i3 * ri;
            v4 += r4 * rr + i4 * ri;
            v5 += r5 * rr + i5 * ri;
            v6 += r6 * rr + i6 * ri;
            v7 += r7 * rr + i7 * ri;
            a00 += r0 * r0 + i0 * i0;
            a01 += r0 * r1 + i0 * i1;
            a02 += r0 * r2 + i0 * i2;
            a03 += r0 * r3 + i0 * i3;
            a04 += r0 * r4 + i0 * i4;
            a05 += r0 * r5 + i0 * i5;
            a06 += r0 * r6 + i0 * i6;
            a07 += r0 * r7 + i0 * i7;
            a11 += r1 * r1 + i1 * i1;
            a12 += r1 * r2 + i1 * i2;
            a13 += r1 * r3 + i1 * i3;
            a14 += r1 * r4 + i1 * i4;
            a15 += r1 * r5 + i1 * i5;
            a16 += r1 * r6 + i1 * i6;
            a17 += r1 * r7 + i1 * i7;
            a22 += r2 * r2 + i2 * i2;
            a23 += r2 * r3 + i2 * i3;
            a24 += r2 * r4 + i2 * i4;
            a25 += r2 * r5 + i2 * i5;
            a26 += r2 * r6 + i2 * i6;
            a27 += r2 * r7 + i2 * i7;
            a33 += r3 * r3 + i3 * i3;
            a34 += r3 * r4 + i3 * i4;
            a35 += r3 * r5 + i3 * i5;
            a36 += r3 * r6 + i3 * i6;
            a37 += r3 * r7 + i3 * i7;
            a44 += r4 * r4 + i4 * i4;
            a45 += r4 * r5 + i4 * i5;
            a46 += r4 * r6 + i4 * i6;
            a47 += r4 * r7 + i4 * i7;
            a55 += r5 * r5 + i5 * i5;
            a56 += r5 * r6 + i5 * i6;
            a57 += r5 * r7 + i5 * i7;
            a66 += r6 * r6 + i6 * i6;
            a67 += r6 * r7 + i6 * i7;
            a77 += r7 * r7 + i7 * i7;
        }
        jtr[0] = v0;
        jtr[1] = v1;
        jtr[2] = v2;
        jtr[3] = v3;
        jtr[4] = v4;
        jtr[5] = v5;
        jtr[6] = v6;
        jtr[7] = v7;
        jtj[0][0] = a00;
        jtj[0][1] = a01;
        jtj[0][2] = a02;
        jtj[0][3] = a03;
        jtj[0][4] = a04;
        jtj[0][5] = a05;
        jtj[0][6] = a06;
        jtj[0][7] = a07;
        jtj[1][1] = a11;
        jtj[1][2] = a12;
        jtj[1][3] = a13;
        jtj[1][4] = a14;
        jtj[1][5] = a15;
        jtj[1][6] = a16;
        jtj[1][7] = a17;
        jtj[2][2] = a22;
        jtj[2][3] = a23;
        jtj[2][4] = a24;
        jtj[2][5] = a25;
        jtj[2][6] = a26;
        jtj[2][7] = a27;
        jtj[3][3] = a33;
        jtj[3][4] = a34;
        jtj[3][5] = a35;
        jtj[3][6] = a36;
        jtj[3][7] = a37;
        jtj[4][4] = a44;
        jtj[4][5] = a45;
        jtj[4][6] = a46;
        jtj[4][7] = a47;
        jtj[5][5] = a55;
        jtj[5][6] = a56;
        jtj[5][7] = a57;
        jtj[6][6] = a66;
        jtj[6][7] = a67;
        jtj[7][7] = a77;
        return cost;
    }
}
