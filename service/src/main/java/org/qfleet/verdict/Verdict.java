package org.qfleet.verdict;

import java.util.List;

/**
 * A result judged against its product's limits.
 *
 * @param status  pass, fail or unknown product
 * @param reasons why it failed, in a fixed order; empty unless {@code status} is FAIL
 */
public record Verdict(VerdictStatus status, List<VerdictReason> reasons) {

    public static final Verdict PASS = new Verdict(VerdictStatus.PASS, List.of());
    public static final Verdict UNKNOWN_PRODUCT = new Verdict(VerdictStatus.UNKNOWN_PRODUCT, List.of());

    public Verdict {
        reasons = List.copyOf(reasons);
        if ((status == VerdictStatus.FAIL) == reasons.isEmpty()) {
            throw new IllegalArgumentException("a failed verdict needs reasons, and only a failed one has them");
        }
    }

    public static Verdict fail(List<VerdictReason> reasons) {
        return new Verdict(VerdictStatus.FAIL, reasons);
    }
}
