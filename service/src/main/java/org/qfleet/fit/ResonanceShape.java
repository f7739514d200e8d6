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
        return new ResonanceShape(m.f0Hz(), m.qLoaded(), a, b, cos);
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
