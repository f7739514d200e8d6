package org.qfleet.fit;

/**
 * Maps the Lorentzian parameters to the resonance shape and to a magnitude-only response.
 *
 * @param asymmetric whether the asymmetry term c is significant; when it is not, it is read as zero,
 *                   because c enters |A| squared and its noise alone would bias the circle size
 */
record LorentzianShape(double referenceHz, double scaleHz, boolean background, boolean asymmetric) {

    ResonanceShape shape(double[] p) {
        double b0 = background ? Math.max(0, p[0]) : 0;
        double a = background ? p[1] : p[0];
        double c = background && asymmetric ? p[2] : 0;
        int o = background ? 2 : 0;
        double f0 = referenceHz + scaleHz * p[o + 1];
        double gamma = Math.abs(scaleHz * p[o + 2]);
        // |A|^2 solves b0 |A|^2 = ((a - |A|^2)^2 + c^2) / 4; the smaller root is the under-coupled reading.
        double u = a;
        if (b0 > 0) {
            double disc = Math.max(0, 4 * a * b0 + 4 * b0 * b0 - c * c);
            u = a + 2 * b0 - Math.sqrt(disc);
        }
        double amplitude = Math.sqrt(Math.max(0, u));
        double bg = Math.sqrt(b0);
        double cos = (amplitude > 0 && bg > 0) ? -(a - u) / (2 * amplitude * bg) : 1;
        return ResonanceShape.fromHalfPowerBand(f0, gamma, amplitude, bg, Math.max(-1, Math.min(1, cos)));
    }

    ResponseModel model(double[] p) {
        double[] q = p.clone();
        return new ResponseModel() {
            @Override
            public void evaluate(double frequencyHz, double[] reIm) {
                int o = background ? 2 : 0;
                double b0 = background ? q[0] : 0;
                double a = background ? q[1] : q[0];
                double c = background ? q[2] : 0;
                double v = ((frequencyHz - referenceHz) / scaleHz - q[o + 1]) / q[o + 2];
                reIm[0] = Math.sqrt(Math.max(0, b0 + (a + c * v) / (1 + v * v)));
                reIm[1] = 0;
            }

            @Override
            public boolean hasPhase() {
                return false;
            }
        };
    }
}
