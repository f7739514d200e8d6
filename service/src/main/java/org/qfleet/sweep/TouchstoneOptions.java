package org.qfleet.sweep;

import java.util.Locale;
import java.util.Optional;
import java.util.regex.Pattern;

/**
 * The option line of a Touchstone file, {@code # <unit> <parameter> <format> R <ohms>}, items in any
 * order and letter case, each defaulting to {@code GHz S MA R 50} (Touchstone 1.1 and 2.0
 * specifications, IBIS Open Forum; recalled from memory). Only S-parameters are supported.
 */
record TouchstoneOptions(FrequencyUnit unit, TouchstoneFormat format, double referenceOhms) {

    static final TouchstoneOptions DEFAULT = new TouchstoneOptions(FrequencyUnit.GHZ, TouchstoneFormat.MA, 50.0);

    private static final Pattern BLANKS = Pattern.compile("\\s+");

    static TouchstoneOptions parse(String line, int lineNumber) throws InvalidSweepException {
        String[] tokens = BLANKS.split(line.substring(1).trim());
        FrequencyUnit unit = null;
        TouchstoneFormat format = null;
        Double reference = null;
        boolean parameterSeen = false;
        for (int i = 0; i < tokens.length; i++) {
            String token = tokens[i];
            if (token.isEmpty()) {
                continue;
            }
            String upper = token.toUpperCase(Locale.ROOT);
            Optional<FrequencyUnit> asUnit = FrequencyUnit.fromSymbol(token);
            if (asUnit.isPresent()) {
                unit = once(unit, asUnit.get(), "frequency unit", lineNumber);
            } else if (upper.equals("RI") || upper.equals("MA") || upper.equals("DB")) {
                format = once(format, TouchstoneFormat.valueOf(upper), "format", lineNumber);
            } else if (upper.equals("S")) {
                parameterSeen = once(parameterSeen ? Boolean.TRUE : null, Boolean.TRUE, "parameter", lineNumber);
            } else if (upper.equals("Y") || upper.equals("Z") || upper.equals("H") || upper.equals("G")) {
                throw new InvalidSweepException(SweepError.UNSUPPORTED_PARAMETER, "line " + lineNumber + ": "
                        + upper + "-parameters are not supported, only S-parameters");
            } else if (upper.equals("R")) {
                if (i + 1 >= tokens.length) {
                    throw syntax(lineNumber, "'R' must be followed by the reference impedance in ohms");
                }
                reference = once(reference, referenceOhms(tokens[++i], lineNumber), "reference impedance", lineNumber);
            } else {
                throw syntax(lineNumber, "unknown option '" + token + "' (expected a frequency unit Hz, kHz, MHz"
                        + " or GHz, the parameter S, a format RI, MA or DB, or R and an impedance)");
            }
        }
        return new TouchstoneOptions(unit != null ? unit : DEFAULT.unit,
                format != null ? format : DEFAULT.format,
                reference != null ? reference : DEFAULT.referenceOhms);
    }

    /** A reference impedance token: a finite positive number of ohms. */
    static double referenceOhms(String token, int lineNumber) throws InvalidSweepException {
        try {
            double ohms = Double.parseDouble(token);
            if (Double.isFinite(ohms) && ohms > 0) {
                return ohms;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw syntax(lineNumber, "reference impedance '" + token + "' is not a positive number of ohms");
    }

    private static <T> T once(T current, T value, String what, int lineNumber) throws InvalidSweepException {
        if (current != null) {
            throw syntax(lineNumber, "the option line gives the " + what + " twice");
        }
        return value;
    }

    private static InvalidSweepException syntax(int lineNumber, String message) {
        return new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX, "line " + lineNumber + ": " + message);
    }
}
