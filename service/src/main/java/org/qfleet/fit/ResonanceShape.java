package org.qfleet.fit;

/**
 * What the coupling corrections need from a fitted trace: position, loaded Q, the size of the
 * resonance circle and of the background, and the circle's rotation.
 *
 * @param f0Hz        resonant frequency
 * @param qLoaded     loaded Q
 * @param amplitude   |A|, the circle diameter (linear)
 * @param background  |B|, the off-resonance level (0 for a transmission peak without leakage)
 * @param cosRotation cos(phi), phi the angle of -A relative to B (1 for an unrotated notch or reflection)
 */
record ResonanceShape(double f0Hz, double qLoaded, double amplitude, double background, double cosRotation) {

    static ResonanceShape of(CircleModel m) {
        double a = m.amplitude();
        double b = m.background();
        double cos = (a > 0 && b > 0)
                ? -(m.amplitudeRe() * m.backgroundRe() + m.amplitudeIm() * m.backgroundIm()) / (a * b)
                : 1;
        return fromPole(m.f0Hz(), m.halfWidthHz(), a, b, cos);
    }

    /**
     * From the complex pole fc + j gamma of a fitted circle. A real resonator responds as
     * 1 / (1 + j QL (f/f0 - f0/f)), whose pole near f0 lies at sqrt(f0^2 - gamma^2) + j gamma, with
     * gamma = f0 / (2 QL) (roots of j QL f^2 + f0 f - j QL f0^2 = 0), so f0 = sqrt(fc^2 + gamma^2).
     */
    static ResonanceShape fromPole(double centreHz, double halfWidthHz, double amplitude, double background,
                                   double cosRotation) {
        double f0 = Math.sqrt(centreHz * centreHz + halfWidthHz * halfWidthHz);
        return new ResonanceShape(f0, f0 / (2 * halfWidthHz), amplitude, background, cosRotation);
    }

    /**
     * From the centre and half width of the half-power band of |S|^2. For the same response the band
     * is exactly f0 / QL wide and centred at sqrt(f0^2 + gamma^2), about f0 / (8 QL^2) above f0
     * (solving QL (f/f0 - f0/f) = +-1).
     */
    static ResonanceShape fromHalfPowerBand(double centreHz, double halfWidthHz, double amplitude, double background,
                                            double cosRotation) {
        double f0 = Math.sqrt(Math.max(0, centreHz * centreHz - halfWidthHz * halfWidthHz));
        return new ResonanceShape(f0, f0 / (2 * halfWidthHz), amplitude, background, cosRotation);
    }

    /** Circle diameter relative to the background: S21 dip depth of a notch, D of a reflection. */
    double relativeDiameter() {
        return amplitude / background;
    }

    /** |S| at f0 relative to the background, |1 + A/B| = sqrt(1 - 2 d cos(phi) + d^2). */
    double relativeLevelAtResonance() {
        double d = relativeDiameter();
        return Math.sqrt(Math.max(0, 1 - 2 * d * cosRotation + d * d));
    }
}
