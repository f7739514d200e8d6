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
    /** |r|^2 at every point from the last pass with normal equations, and the parameters of that pass. */
    private final double[] lastPower;
    private double[] lastPowerAt = new double[0];

    CircleProblem(double[] x, double[] zr, double[] zi, boolean background, boolean tilt) {
        this.x = x;
        this.zr = zr;
        this.zi = zi;
        this.background = background;
        this.tilt = tilt;
        this.equallySpaced = Phasors.equallySpaced(x);
        java.util.Arrays.fill(scoredAt, Double.NaN);
        this.gain = new double[x.length];
        this.lastPower = new double[x.length];
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
        lastPowerAt = p.clone();
        for (int i = 0; i < 7; i++) {
            System.arraycopy(jtj8[i], i, jtj[i], i, 7 - i);
            jtr[i] = jtr8[i];
        }
        return cost;
    }

    private double costOnly(double[] p) {
        return residuals(p, null);
    }

    /**
     * |r|^2 at every point for parameters p, for the residual checks: kept from the last pass when it
     * was made at p (the optimizer's last pass normally is), else one more pass.
     */
    double[] residualPower(double[] p) {
        if (java.util.Arrays.equals(p, lastPowerAt)) {
            return lastPower.clone();
        }
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
        double s0 = 0, v1 = 0, t0 = 0, t1 = 0;
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
            double r2 = rr * rr + ri * ri;
            lastPower[k] = r2;
            cost += r2;
            s0 += iq;
            v1 += u * iq;
            t0 += iq2;
            t1 += u * iq2;
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
        lastPowerAt = p.clone();
        // The other geometric sums follow from these four, with u^2 / |D|^2 = 1 - g^2 / |D|^2 and x = u + x0.
        int n = x.length;
        double uu1 = n - g2 * s0;                       // sum u^2 / |D|^2
        double t2 = s0 - g2 * t0;                       // sum u^2 / |D|^4
        double w3 = v1 - g2 * t1;                       // sum u^3 / |D|^4
        double u1 = v1 + x0 * s0;                       // sum x / |D|^2
        double u2 = t1 + x0 * t0;                       // sum x / |D|^4
        double u3 = t2 + x0 * t1;                       // sum x u / |D|^4
        double u4 = uu1 + 2 * x0 * v1 + x0 * x0 * s0;   // sum x^2 / |D|^2
        double u5 = uu1 + x0 * v1;                      // sum x u / |D|^2
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

    /**
     * Normal equations of the model with background and tilt, parameters [br, bi, ar, ai, x0, g, t, s].
     * With k = exp(s x), L = g / D, q = k A / D^2 and m = k (B + A L), the eight columns of J are the
     * complex vectors k, j k, k L, j k L, j g q, j u q, -j x m and x m: every entry of J^T J is the
     * real or imaginary part of one of a few sums over the points (k^2, k^2 L, k q, k u q, conj(kL) q,
     * |q|^2 and their products with x m), and those pairs (B and j B, A and j A, t and s) share them.
     */
    private double tiltKernel(double[] p, double[][] jtj, double[] jtr) {
        double br = p[0];
        double bi = p[1];
        double ar = p[2];
        double ai = p[3];
        double x0 = p[4];
        double g = p[5];
        Phasors.fill(p[6], x, equallySpaced, cos, sin);
        Phasors.fillGain(p[7], x, equallySpaced, gain);
        double g2 = g * g;
        double cost = 0;
        double kk = 0, klR = 0, klI = 0, kqR = 0, kqI = 0, kuqR = 0, kuqI = 0;
        double lqR = 0, lqI = 0, luqR = 0, luqI = 0, qq = 0, uqq = 0, uuqq = 0;
        double kmR = 0, kmI = 0, lmR = 0, lmI = 0, qmR = 0, qmI = 0, uqmR = 0, uqmI = 0, mm = 0;
        double krR = 0, krI = 0, lrR = 0, lrI = 0, qrI = 0, uqrI = 0, mrR = 0, mrI = 0;
        for (int i = 0; i < x.length; i++) {
            double c = cos[i];
            double s = sin[i];
            double xk = x[i];
            double wr = c * zr[i] + s * zi[i];
            double wi = c * zi[i] - s * zr[i];
            double u = xk - x0;
            double dd = 1 / (g2 + u * u);
            double lr = g2 * dd;
            double li = -g * u * dd;
            double k = gain[i];
            // kL, the model m and x m
            double klr = k * lr;
            double kli = k * li;
            double mr = k * br + ar * klr - ai * kli;
            double mi = k * bi + ar * kli + ai * klr;
            double rr = wr - mr;
            double ri = wi - mi;
            double r2 = rr * rr + ri * ri;
            lastPower[i] = r2;
            cost += r2;
            double xmr = xk * mr;
            double xmi = xk * mi;
            // q = k A / D^2, with 1 / D^2 = (g^2 - u^2 - 2 j g u) / |D|^4
            double dd2 = k * dd * dd;
            double er = (g2 - u * u) * dd2;
            double ei = -2 * g * u * dd2;
            double qr = ar * er - ai * ei;
            double qi = ar * ei + ai * er;
            double ku = k * u;
            kk += k * k;
            klR += k * klr;
            klI += k * kli;
            kqR += k * qr;
            kqI += k * qi;
            kuqR += ku * qr;
            kuqI += ku * qi;
            // conj(kL) q
            double aR = klr * qr + kli * qi;
            double aI = klr * qi - kli * qr;
            lqR += aR;
            lqI += aI;
            luqR += u * aR;
            luqI += u * aI;
            double q2 = qr * qr + qi * qi;
            qq += q2;
            uqq += u * q2;
            uuqq += u * u * q2;
            kmR += k * xmr;
            kmI += k * xmi;
            lmR += klr * xmr + kli * xmi;
            lmI += klr * xmi - kli * xmr;
            // conj(q) x m
            double bR = qr * xmr + qi * xmi;
            double bI = qr * xmi - qi * xmr;
            qmR += bR;
            qmI += bI;
            uqmR += u * bR;
            uqmI += u * bI;
            mm += xmr * xmr + xmi * xmi;
            krR += k * rr;
            krI += k * ri;
            lrR += klr * rr + kli * ri;
            lrI += klr * ri - kli * rr;
            double cI = qr * ri - qi * rr;
            qrI += cI;
            uqrI += u * cI;
            mrR += xmr * rr + xmi * ri;
            mrI += xmr * ri - xmi * rr;
        }
        lastPowerAt = p.clone();
        double[] r0 = jtj[0];
        double[] r1 = jtj[1];
        double[] r2 = jtj[2];
        double[] r3 = jtj[3];
        r0[0] = kk;
        r0[1] = 0;
        r0[2] = klR;
        r0[3] = -klI;
        r0[4] = -g * kqI;
        r0[5] = -kuqI;
        r0[6] = kmI;
        r0[7] = kmR;
        r1[1] = kk;
        r1[2] = klI;
        r1[3] = klR;
        r1[4] = g * kqR;
        r1[5] = kuqR;
        r1[6] = -kmR;
        r1[7] = kmI;
        // |kL|^2 = k^2 Re(L), since |L|^2 = Re(L) = g^2 / |D|^2
        r2[2] = klR;
        r2[3] = 0;
        r2[4] = -g * lqI;
        r2[5] = -luqI;
        r2[6] = lmI;
        r2[7] = lmR;
        r3[3] = klR;
        r3[4] = g * lqR;
        r3[5] = luqR;
        r3[6] = -lmR;
        r3[7] = lmI;
        jtj[4][4] = g2 * qq;
        jtj[4][5] = g * uqq;
        jtj[4][6] = -g * qmR;
        jtj[4][7] = g * qmI;
        jtj[5][5] = uuqq;
        jtj[5][6] = -uqmR;
        jtj[5][7] = uqmI;
        jtj[6][6] = mm;
        jtj[6][7] = 0;
        jtj[7][7] = mm;
        jtr[0] = krR;
        jtr[1] = krI;
        jtr[2] = lrR;
        jtr[3] = lrI;
        jtr[4] = g * qrI;
        jtr[5] = uqrI;
        jtr[6] = -mrI;
        jtr[7] = mrR;
        return cost;
    }
}
