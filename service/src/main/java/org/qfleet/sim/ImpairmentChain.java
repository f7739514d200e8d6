package org.qfleet.sim;

import java.util.random.RandomGenerator;
import org.qfleet.sweep.Trace;

/**
 * Applies {@link Impairments} to one trace in place, in the documented order: tilt, leakage
 * (transmission traces only), delay exp(-j 2 pi f tau) (the same for every trace), complex Gaussian
 * noise, then the reduction to magnitude.
 */
final class ImpairmentChain {

    private final Impairments impairments;
    private final double sigma;
    private final double centreHz;
    private final double spanHz;
    private final RandomGenerator random;

    ImpairmentChain(Impairments impairments, double sigma, SweepPlan plan, RandomGenerator random) {
        this.impairments = impairments;
        this.sigma = sigma;
        this.centreHz = plan.centreHz();
        this.spanHz = plan.spanHz();
        this.random = random;
    }

    Trace apply(double[] frequencyHz, double[] re, double[] im, boolean transmissionTrace) {
        double tiltDb = impairments.tiltDbPerSpan();
        double tau = impairments.delaySeconds();
        double leakRe = transmissionTrace ? impairments.leakageRe() : 0;
        double leakIm = transmissionTrace ? impairments.leakageIm() : 0;
        for (int i = 0; i < re.length; i++) {
            double f = frequencyHz[i];
            double gain = tiltDb == 0 ? 1 : Math.pow(10, tiltDb * (f - centreHz) / spanHz / 20);
            double x = re[i] * gain + leakRe;
            double y = im[i] * gain + leakIm;
            if (tau != 0) {
                double angle = -2 * Math.PI * f * tau;
                double c = Math.cos(angle);
                double s = Math.sin(angle);
                double rotated = x * c - y * s;
                y = x * s + y * c;
                x = rotated;
            }
            if (sigma > 0) {
                x += sigma * random.nextGaussian();
                y += sigma * random.nextGaussian();
            }
            re[i] = x;
            im[i] = y;
        }
        if (!impairments.magnitudeOnly()) {
            return Trace.complex(re, im);
        }
        for (int i = 0; i < re.length; i++) {
            re[i] = Math.hypot(re[i], im[i]);
        }
        return Trace.magnitudeOnly(re);
    }
}
