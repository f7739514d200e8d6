package org.qfleet.fit;

/** Order statistics without a full sort (Hoare's selection, expected linear time). */
final class Select {

    private Select() {
    }

    /** The median of {@code v}; reorders {@code v}. */
    static double median(double[] v, int length) {
        int m = length / 2;
        double upper = kth(v, length, m);
        if (length % 2 == 1) {
            return upper;
        }
        double lower = v[0];
        for (int i = 1; i < m; i++) {
            lower = Math.max(lower, v[i]);
        }
        return 0.5 * (lower + upper);
    }

    /** The k-th smallest (0-based) of the first {@code length} values; afterwards v[0..k) holds the smaller ones. */
    static double kth(double[] v, int length, int k) {
        int lo = 0;
        int hi = length - 1;
        while (lo < hi) {
            double pivot = medianOfThree(v[lo], v[(lo + hi) >>> 1], v[hi]);
            int i = lo;
            int j = hi;
            while (i <= j) {
                while (v[i] < pivot) {
                    i++;
                }
                while (v[j] > pivot) {
                    j--;
                }
                if (i <= j) {
                    double t = v[i];
                    v[i] = v[j];
                    v[j] = t;
                    i++;
                    j--;
                }
            }
            if (k <= j) {
                hi = j;
            } else if (k >= i) {
                lo = i;
            } else {
                return v[k];
            }
        }
        return v[k];
    }

    /**
     * The middle one of three values: a pivot that stays near the median on sorted or peaked data
     * (a smoothed resonance line has its largest value in the middle), where the middle element alone
     * makes the selection quadratic.
     */
    private static double medianOfThree(double a, double b, double c) {
        return Math.max(Math.min(a, b), Math.min(Math.max(a, b), c));
    }
}
