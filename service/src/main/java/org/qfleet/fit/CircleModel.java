package org.qfleet.fit;

/**
 * The resonance circle with delay and tilt:
 * S(f) = exp(-j 2 pi (f - fRef) tau) exp(k (f - fRef)) (B + A / (1 + j (f - f0) / gamma)),
 * where gamma = f0 / (2 QL) is the half width at half power, k a magnitude slope (nepers per hertz, linear in decibels), A the complex resonance (the circle's
 * diameter as a vector) and B the complex background (leakage, or the off-resonance level of a
 * notch or a reflection). The phase of A relative to B is the rotation from coupling reactance
 * (Kajfez, IEEE Trans. MTT 1994; Probst et al., Rev. Sci. Instrum. 86, 024706, 2015).
 */
public record CircleModel(
        double referenceHz, double f0Hz, double halfWidthHz, double delaySeconds,
        double amplitudeRe, double amplitudeIm, double backgroundRe, double backgroundIm, double tiltPerHz)
        implements ResponseModel {

    public double qLoaded() {
        return f0Hz / (2 * halfWidthHz);
    }

    // Amplitudes of S-parameters are far from where squaring them could overflow or underflow, so
    // a plain root serves (Math.hypot guards against that at several times the cost).
    public double amplitude() {
        return Math.sqrt(amplitudeRe * amplitudeRe + amplitudeIm * amplitudeIm);
    }

    public double background() {
        return Math.sqrt(backgroundRe * backgroundRe + backgroundIm * backgroundIm);
    }

    @Override
    public void evaluate(double frequencyHz, double[] reIm) {
        double u = (frequencyHz - f0Hz) / halfWidthHz;
        double den = 1 + u * u;
        double lr = 1 / den;
        double li = -u / den;
        double mr = backgroundRe + amplitudeRe * lr - amplitudeIm * li;
        double mi = backgroundIm + amplitudeRe * li + amplitudeIm * lr;
        double phase = -2 * Math.PI * (frequencyHz - referenceHz) * delaySeconds;
        double gain = Math.exp(tiltPerHz * (frequencyHz - referenceHz));
        double c = gain * Math.cos(phase);
        double s = gain * Math.sin(phase);
        reIm[0] = mr * c - mi * s;
        reIm[1] = mr * s + mi * c;
    }

    @Override
    public boolean hasPhase() {
        return true;
    }
}
