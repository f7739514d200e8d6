package org.qfleet.fit;

/** A fitted response that can be evaluated anywhere in the sweep, for plots and residuals. */
public interface ResponseModel {

    /** Writes the model's real and imaginary parts at {@code frequencyHz} into {@code reIm[0..1]}. */
    void evaluate(double frequencyHz, double[] reIm);

    /** False when the model describes the magnitude only (then {@code reIm[1]} is zero). */
    boolean hasPhase();
}
