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
    private final double[][] scoreJtj = new double[7][7];
    private final double[] scoreJtr = new double[7];
    private final double[] scoredAt = new double[5];
    /** |r|^2 at every point from the last pass with normal equations, and the parameters of that pass. */
    private double[] lastPower;
    private double[] lastPowerAt = new double[0];

    CircleProblem(double[] x, double[] zr, double[] zi, boolean background, boolean tilt) {
        this(x, zr, zi, background, tilt, Phasors.equallySpaced(x));
    }

    /** With {@code equallySpaced} already known ({@link Phasors#equallySpaced}) for these abscissae. */
    CircleProblem(double[] x, double[] zr, double[] zi, boolean background, boolean tilt, boolean equallySpaced) {
        this.x = x;
        this.zr = zr;
        this.zi = zi;
        this.background = background;
        this.tilt = tilt;
        this.equallySpaced = equallySpaced;
        java.util.Arrays.fill(scoredAt, Double.NaN);
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
     * |r|^2 at every point for parameters p, for the residual checks: the array of the last pass when
     * it was made at p (the optimizer's last pass normally is), handed over rather than copied (a later
     * pass starts a new one), else one more pass.
     */
    double[] residualPower(double[] p) {
        if (java.util.Arrays.equals(p, lastPowerAt)) {
            double[] out = lastPower;
            lastPower = null;
            lastPowerAt = new double[0];
            return out;
        }
        double[] out = new double[x.length];
        residuals(p, out);
        return out;
    }

    /** The array the next pass writes |r|^2 into. */
    private double[] power() {
        if (lastPower == null) {
            lastPower = new double[x.length];
        }
        return lastPower;
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
        PhasorWalk phasor = PhasorWalk.of(p[o + 4], x, equallySpaced);
        double[] gain = PassScratch.gain(x.length);
        if (tilt) {
            Phasors.fillGain(slope, x, equallySpaced, gain);
        }
        double g2 = g * g;
        double cost = 0;
        for (int k = 0; k < x.length; k++) {
            phasor.stepTo(k);
            double wr = phasor.c * zr[k] + phasor.s * zi[k];
            double wi = phasor.c * zi[k] - phasor.s * zr[k];
            double u = x[k] - x0;
            double dd = 1 / (g2 + u * u);
            double lr = g2 * dd;
            double li = -g * u * dd;
            double k1 = tilt ? gain[k] : 1;
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
     * of r on 1, conj(L) and conj(L)^2 (those on u conj(1/D^2) and x conj(L) follow from them, since
     * u conj(L) = j g (1 - conj(L))). Parameters [ar, ai, x0, g, t];
     * the extension orders them [br, bi, ar, ai, x0, g, t].
     */
    double plainWithBackgroundScore(double[] p, double[][] jtj, double[] jtr, double[][] jtj7, double[] jtr7) {
        double ar = p[0];
        double ai = p[1];
        double x0 = p[2];
        double g = p[3];
        PhasorWalk phasor = PhasorWalk.of(p[4], x, equallySpaced);
        double[] power = power();
        double g2 = g * g;
        double cost = 0;
        double s0 = 0, v1 = 0, t0 = 0, t1 = 0;
        double c0r = 0, c0i = 0, c1r = 0, c1i = 0, c2r = 0, c2i = 0;
        for (int k = 0; k < x.length; k++) {
            phasor.stepTo(k);
            double c = phasor.c;
            double s = phasor.s;
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
            power[k] = r2;
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
            // g^2 conj(1/D^2) r = conj(L) (conj(L) r), since L = g / D
            c2r += lr * pr + li * pi;
            c2i += lr * pi - li * pr;
        }
        lastPowerAt = p.clone();
        // u conj(L) = j g (1 - conj(L)) gives the projections with a factor u or x = u + x0 from these:
        // C3 = sum u conj(L)^2 r = j g (C1 - C2) and C4 = sum x conj(L) r = j g (C0 - C1) + x0 C1.
        double c3r = -g * (c1i - c2i);
        double c3i = g * (c1r - c2r);
        double c4r = -g * (c0i - c1i) + x0 * c1r;
        double c4i = g * (c0r - c1r) + x0 * c1i;
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
            (ar * c2i - ai * c2r) / g,                    // g Im(conj(A) C2), with g^2 C2 summed
            (ar * c3i - ai * c3r) / g2,                   // Im(conj(A) C3), with g^2 C3 summed
            -(ar * c4i - ai * c4r)                        // -Im(conj(A) C4)
        };
        System.arraycopy(v, 0, jtr, 0, 5);
        placeUpper5x5(e, jtj, 0);
        if (jtj7 != null) {
            System.arraycopy(v, 0, jtr7, 2, 5);
            placeUpper5x5(e, jtj7, 2);
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

    /** Copies the 5 x 5 upper triangle given by rows into {@code m}, starting at row and column {@code offset}. */
    private static void placeUpper5x5(double[] upper, double[][] m, int offset) {
        int k = 5;
        int idx = 0;
        for (int i = 0; i < k; i++) {
            for (int j = i; j < k; j++) {
                m[i + offset][j + offset] = upper[idx++];
            }
        }
    }

    /**
     * Normal equations of the model with background and tilt, parameters [br, bi, ar, ai, x0, g, t, s].
     * With k = exp(s x), D = g + j u, L = g / D, q = k A / D^2 and m = k (B + A L), the eight columns of
     * J are the complex vectors k, j k, k L, j k L, j g q, j u q, -j x m and x m, so every entry of J^T J
     * is the real or imaginary part of a sum of k^2 times powers of u, x and 1/D. With x = u + x0 and
     * u^2 / |D|^2 = 1 - g^2 / |D|^2 all of those follow from seven sums S[a][b] = sum k^2 u^a / |D|^2b;
     * J^T r needs four projections of the residual r (two more follow from them, since
     * u conj(L) = j g (1 - conj(L))). One pass accumulates just these.
     */
    private double tiltKernel(double[] p, double[][] jtj, double[] jtr) {
        double br = p[0];
        double bi = p[1];
        double ar = p[2];
        double ai = p[3];
        double x0 = p[4];
        double g = p[5];
        PhasorWalk phasor = PhasorWalk.of(p[6], x, equallySpaced);
        double[] gain = PassScratch.gain(x.length);
        Phasors.fillGain(p[7], x, equallySpaced, gain);
        double[] power = power();
        double g2 = g * g;
        double cost = 0;
        double s00 = 0, s10 = 0, s20 = 0, s01 = 0, s11 = 0, s02 = 0, s12 = 0;
        double krR = 0, krI = 0, xkrR = 0, xkrI = 0, klrR = 0, klrI = 0;
        double p2R = 0, p2I = 0;
        for (int i = 0; i < x.length; i++) {
            phasor.stepTo(i);
            double c = phasor.c;
            double s = phasor.s;
            double xk = x[i];
            double wr = c * zr[i] + s * zi[i];
            double wi = c * zi[i] - s * zr[i];
            double u = xk - x0;
            double iq = 1 / (g2 + u * u);
            double lr = g2 * iq;
            double li = -g * u * iq;
            double k = gain[i];
            double rr = wr - k * (br + ar * lr - ai * li);
            double ri = wi - k * (bi + ar * li + ai * lr);
            double r2 = rr * rr + ri * ri;
            power[i] = r2;
            cost += r2;
            double w0 = k * k;
            double w1 = w0 * iq;
            double w2 = w1 * iq;
            double uw0 = u * w0;
            s00 += w0;
            s10 += uw0;
            s20 += u * uw0;
            s01 += w1;
            s11 += u * w1;
            s02 += w2;
            s12 += u * w2;
            double kr = k * rr;
            double ki = k * ri;
            krR += kr;
            krI += ki;
            xkrR += xk * kr;
            xkrI += xk * ki;
            // conj(L) k r
            double lR = lr * kr + li * ki;
            double lI = lr * ki - li * kr;
            klrR += lR;
            klrI += lI;
            // g^2 conj(1/D^2) k r = conj(L) (conj(L) k r), since L = g / D
            p2R += lr * lR + li * lI;
            p2I += lr * lI - li * lR;
        }
        lastPowerAt = p.clone();
        Z b = new Z(br, bi);
        Z a = new Z(ar, ai);
        double a2 = a.re * a.re + a.im * a.im;
        // S[a][b] with more powers of u, from u^2 / |D|^2 = 1 - g^2 / |D|^2
        double s21 = s00 - g2 * s01;
        double s22 = s01 - g2 * s02;
        double s31 = s10 - g2 * s11;
        double s32 = s11 - g2 * s12;
        double s42 = s21 - g2 * s22;
        // sums over k^2 times: L, 1/D^2, u/D^2, u^2/D^2
        Z kl = new Z(g2 * s01, -g * s11);
        Z kd2 = new Z(2 * g2 * s02 - s01, -2 * g * s12);
        Z kud2 = new Z(2 * g2 * s12 - s11, -2 * g * s22);
        Z kuud2 = new Z(g2 * s22 - s42, -2 * g * s32);
        // ... and with x = u + x0: x, x/|D|^2, x u/|D|^2, x L, x/D^2, x u/D^2, x conj(1/D^2) L, x u conj(1/D^2) L, x^2 ...
        double kx = s10 + x0 * s00;
        double kxIq = s11 + x0 * s01;
        double kxuIq = s21 + x0 * s11;
        Z kxl = new Z(g2 * kxIq, -g * kxuIq);
        Z kxd2 = kud2.plus(kd2.times(x0));
        Z kxud2 = kuud2.plus(kud2.times(x0));
        Z kxcd2l = new Z(g2 * (s12 + x0 * s02), g * (s22 + x0 * s12));
        Z kxucd2l = new Z(g2 * (s22 + x0 * s12), g * (s32 + x0 * s22));
        double kxx = s20 + 2 * x0 * s10 + x0 * x0 * s00;
        double kxxIq = s21 + 2 * x0 * s11 + x0 * x0 * s01;
        Z kxxl = new Z(g2 * kxxIq, -g * (s31 + 2 * x0 * s21 + x0 * x0 * s11));
        // The sums of the columns' products.
        Z kq = a.times(kd2);
        Z kuq = a.times(kud2);
        Z lq = a.times(new Z(g2 * s02, -g * s12));
        Z luq = a.times(new Z(g2 * s12, -g * s22));
        double qq = a2 * s02;
        double uqq = a2 * s12;
        double uuqq = a2 * s22;
        Z km = kxl.times(a).plus(b.times(kx));
        Z lm = b.times(kxl.conj()).plus(a.times(g2 * kxIq));
        Z ab = a.conj().times(b);
        Z qm = ab.times(kxd2.conj()).plus(kxcd2l.times(a2));
        Z uqm = ab.times(kxud2.conj()).plus(kxucd2l.times(a2));
        double mm = (b.re * b.re + b.im * b.im) * kxx + 2 * b.conj().times(a).times(kxxl).re + a2 * g2 * kxxIq;
        double[] r0 = jtj[0];
        double[] r1 = jtj[1];
        double[] r2 = jtj[2];
        double[] r3 = jtj[3];
        r0[0] = s00;
        r0[1] = 0;
        r0[2] = kl.re;
        r0[3] = -kl.im;
        r0[4] = -g * kq.im;
        r0[5] = -kuq.im;
        r0[6] = km.im;
        r0[7] = km.re;
        r1[1] = s00;
        r1[2] = kl.im;
        r1[3] = kl.re;
        r1[4] = g * kq.re;
        r1[5] = kuq.re;
        r1[6] = -km.re;
        r1[7] = km.im;
        // |kL|^2 = k^2 Re(L), since |L|^2 = Re(L) = g^2 / |D|^2
        r2[2] = kl.re;
        r2[3] = 0;
        r2[4] = -g * lq.im;
        r2[5] = -luq.im;
        r2[6] = lm.im;
        r2[7] = lm.re;
        r3[3] = kl.re;
        r3[4] = g * lq.re;
        r3[5] = luq.re;
        r3[6] = -lm.re;
        r3[7] = lm.im;
        jtj[4][4] = g2 * qq;
        jtj[4][5] = g * uqq;
        jtj[4][6] = -g * qm.re;
        jtj[4][7] = g * qm.im;
        jtj[5][5] = uuqq;
        jtj[5][6] = -uqm.re;
        jtj[5][7] = uqm.im;
        jtj[6][6] = mm;
        jtj[6][7] = 0;
        jtj[7][7] = mm;
        // The residual's projections.
        // P2 (and so P3) summed times g^2.
        double qrI = a.conj().times(new Z(p2R, p2I)).im / g2;
        // u conj(L) = j g (1 - conj(L)): sum u conj(L)^2 k r = j g (KLR - P2), sum x conj(L) k r = j g (KR - KLR) + x0 KLR.
        Z klr = new Z(klrR, klrI);
        Z p3 = new Z(-g * (klrI - p2I), g * (klrR - p2R));
        Z xklr = new Z(-g * (krI - klrI), g * (krR - klrR)).plus(klr.times(x0));
        double uqrI = a.conj().times(p3).im / g2;
        Z mr = b.conj().times(new Z(xkrR, xkrI)).plus(a.conj().times(xklr));
        jtr[0] = krR;
        jtr[1] = krI;
        jtr[2] = klrR;
        jtr[3] = klrI;
        jtr[4] = g * qrI;
        jtr[5] = uqrI;
        jtr[6] = -mr.im;
        jtr[7] = mr.re;
        return cost;
    }

    /** A complex number for the few products after a pass. */
    private record Z(double re, double im) {

        Z plus(Z o) {
            return new Z(re + o.re, im + o.im);
        }

        Z times(Z o) {
            return new Z(re * o.re - im * o.im, re * o.im + im * o.re);
        }

        Z times(double f) {
            return new Z(re * f, im * f);
        }

        Z conj() {
            return new Z(re, -im);
        }
    }
}
