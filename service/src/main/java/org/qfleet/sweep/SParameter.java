package org.qfleet.sweep;

import java.util.Locale;

/** The scattering parameters a sweep may carry. */
public enum SParameter {
    S11, S21, S12, S22;

    /** The name used in sweep messages ({@code s11}, {@code s21}, ...). */
    public String wireName() {
        return name().toLowerCase(Locale.ROOT);
    }
}
