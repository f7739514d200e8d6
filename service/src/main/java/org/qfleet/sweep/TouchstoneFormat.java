package org.qfleet.sweep;

/**
 * How one complex value is written as a pair of numbers, in Touchstone files (RI, MA, DB) and in
 * sweep messages ({@code re/im}, {@code mag/deg}, {@code db/deg}). Angles are in degrees and dB
 * means 20·log10 of the linear magnitude.
 */
public enum TouchstoneFormat {
    /** Real part, imaginary part. */
    RI {
        @Override
        public void toRectangular(double first, double second, double[] reIm) {
            reIm[0] = first;
            reIm[1] = second;
        }

        @Override
        public double first(double re, double im) {
            return re;
        }

        @Override
        public double second(double re, double im) {
            return im;
        }
    },
    /** Linear magnitude, angle in degrees. */
    MA {
        @Override
        public void toRectangular(double first, double second, double[] reIm) {
            polar(first, second, reIm);
        }

        @Override
        public double first(double re, double im) {
            return Math.hypot(re, im);
        }
    },
    /** Magnitude in dB (20·log10), angle in degrees. */
    DB {
        @Override
        public void toRectangular(double first, double second, double[] reIm) {
            polar(linearMagnitude(first), second, reIm);
        }

        @Override
        public double first(double re, double im) {
            return 20.0 * Math.log10(Math.hypot(re, im));
        }
    };

    /** Converts a pair written in this format to real and imaginary part: {@code reIm[0]}, {@code reIm[1]}. */
    public abstract void toRectangular(double first, double second, double[] reIm);

    /** The first number of the pair for a complex value (RI: real part, MA: magnitude, DB: dB). */
    public abstract double first(double re, double im);

    /** The second number of the pair (RI: imaginary part, MA and DB: angle in degrees). */
    public double second(double re, double im) {
        return Math.toDegrees(Math.atan2(im, re));
    }

    /** Linear magnitude of a value in dB: 10^(dB/20). */
    public static double linearMagnitude(double decibels) {
        return Math.pow(10.0, decibels / 20.0);
    }

    private static void polar(double magnitude, double degrees, double[] reIm) {
        double radians = Math.toRadians(degrees);
        reIm[0] = magnitude * Math.cos(radians);
        reIm[1] = magnitude * Math.sin(radians);
    }
}
