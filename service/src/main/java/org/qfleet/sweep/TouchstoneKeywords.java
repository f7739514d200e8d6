package org.qfleet.sweep;

import java.util.HashSet;
import java.util.Locale;
import java.util.Set;

/**
 * The header keywords of a Touchstone 2.0 file (Touchstone File Format Specification 2.0, IBIS Open
 * Forum, 2009; recalled from memory), checked as they are read: [Number of Ports], [Two-Port Data
 * Order], [Number of Frequencies], [Number of Noise Frequencies], [Reference], [Matrix Format].
 */
final class TouchstoneKeywords {

    private final SweepLimits limits;
    private final Set<String> seen = new HashSet<>();
    private int ports;
    private String twoPortOrder;
    private int twoPortOrderLine;
    private int frequencies = -1;
    private int frequenciesLine;
    private int noiseFrequencies = -1;
    private double[] references;
    private int referenceCount;
    private int referenceLine;

    TouchstoneKeywords(SweepLimits limits) {
        this.limits = limits;
    }

    /** Applies one header keyword; {@code keyword} is the name between the brackets as written. */
    void apply(String keyword, String argument, int line, NumberTokens numbers) throws InvalidSweepException {
        String key = keyword.toLowerCase(Locale.ROOT);
        if (!seen.add(key)) {
            throw syntax(line, "[" + keyword + "] appears twice");
        }
        switch (key) {
            case "number of ports" -> ports = ports(argument, line);
            case "two-port data order" -> twoPortOrder(argument, line);
            case "number of frequencies" -> {
                frequencies = count(keyword, argument, line);
                frequenciesLine = line;
                if (frequencies > limits.maxPoints()) {
                    throw new InvalidSweepException(SweepError.TOO_MANY_POINTS, "line " + line + ": " + frequencies
                            + " frequencies, more than the limit of " + limits.maxPoints());
                }
            }
            case "number of noise frequencies" -> noiseFrequencies = count(keyword, argument, line);
            case "reference" -> reference(argument, line, numbers);
            case "matrix format" -> matrixFormat(argument, line);
            case "mixed-mode order" -> throw new InvalidSweepException(SweepError.UNSUPPORTED_PARAMETER,
                    "line " + line + ": mixed-mode parameters are not supported");
            default -> throw syntax(line, "unknown keyword [" + keyword + "]");
        }
    }

    /** True while a [Reference] keyword still waits for values on the following lines. */
    boolean expectsReferenceValues() {
        return references != null && referenceCount < references.length;
    }

    /** Takes reference impedances continued on a line after [Reference]. */
    void addReferenceValues(double[] values, int count, int line) throws InvalidSweepException {
        for (int i = 0; i < count; i++) {
            if (referenceCount == references.length) {
                throw syntax(line, "[Reference] gives more values than the " + ports + " ports");
            }
            if (!(values[i] > 0)) {
                throw syntax(line, "reference impedance " + values[i] + " is not a positive number of ohms");
            }
            references[referenceCount++] = values[i];
        }
    }

    /** Checks that the header has all that network data needs. */
    void checkComplete(int line) throws InvalidSweepException {
        if (ports == 0) {
            throw syntax(line, "[Number of Ports] must come before [Network Data]");
        }
        if (frequencies < 0) {
            throw syntax(line, "[Number of Frequencies] must come before [Network Data]");
        }
        if (ports == 1 && twoPortOrder != null) {
            throw syntax(twoPortOrderLine, "[Two-Port Data Order] is only allowed in 2-port files");
        }
        if (ports == 2 && twoPortOrder == null) {
            throw syntax(line, "a 2-port file needs [Two-Port Data Order] (12_21 or 21_12) before [Network Data]");
        }
        if (expectsReferenceValues()) {
            throw syntax(referenceLine, "[Reference] gives " + referenceCount + " values for " + ports + " ports");
        }
    }

    int ports() {
        return ports;
    }

    /** The S-parameter of each pair in a network data record. */
    SParameter[] order() {
        if (ports == 1) {
            return new SParameter[] {SParameter.S11};
        }
        return "12_21".equals(twoPortOrder)
                ? new SParameter[] {SParameter.S11, SParameter.S12, SParameter.S21, SParameter.S22}
                : new SParameter[] {SParameter.S11, SParameter.S21, SParameter.S12, SParameter.S22};
    }

    int frequencies() {
        return frequencies;
    }

    int frequenciesLine() {
        return frequenciesLine;
    }

    /** The declared number of noise frequencies, or -1 when not given. */
    int noiseFrequencies() {
        return noiseFrequencies;
    }

    /** The common reference impedance of all ports, or {@code optionLineOhms} when [Reference] is absent. */
    double referenceOhms(double optionLineOhms) throws InvalidSweepException {
        if (references == null) {
            return optionLineOhms;
        }
        for (double r : references) {
            if (r != references[0]) {
                throw new InvalidSweepException(SweepError.UNSUPPORTED_PARAMETER, "line " + referenceLine
                        + ": ports with different reference impedances are not supported ("
                        + java.util.Arrays.toString(references) + " ohms)");
            }
        }
        return references[0];
    }

    private static int ports(String argument, int line) throws InvalidSweepException {
        int n = count("Number of Ports", argument, line);
        if (n < 1) {
            throw syntax(line, "[Number of Ports] must be at least 1");
        }
        if (n > 2) {
            throw new InvalidSweepException(SweepError.UNSUPPORTED_PARAMETER,
                    "line " + line + ": " + n + "-port data is not supported, only 1- and 2-port files");
        }
        return n;
    }

    private void twoPortOrder(String argument, int line) throws InvalidSweepException {
        if (!argument.equals("12_21") && !argument.equals("21_12")) {
            throw syntax(line, "[Two-Port Data Order] must be 12_21 or 21_12, found '" + argument + "'");
        }
        twoPortOrder = argument;
        twoPortOrderLine = line;
    }

    private void reference(String argument, int line, NumberTokens numbers) throws InvalidSweepException {
        if (ports == 0) {
            throw syntax(line, "[Reference] must follow [Number of Ports]");
        }
        references = new double[ports];
        referenceLine = line;
        addReferenceValues(numbers.values(), numbers.parse(argument, line), line);
    }

    private static void matrixFormat(String argument, int line) throws InvalidSweepException {
        String format = argument.toLowerCase(Locale.ROOT);
        if (format.equals("lower") || format.equals("upper")) {
            throw new InvalidSweepException(SweepError.UNSUPPORTED_PARAMETER,
                    "line " + line + ": [Matrix Format] " + argument + " is not supported, only Full");
        }
        if (!format.equals("full")) {
            throw syntax(line, "[Matrix Format] must be Full, Lower or Upper, found '" + argument + "'");
        }
    }

    private static int count(String keyword, String argument, int line) throws InvalidSweepException {
        try {
            int n = Integer.parseInt(argument);
            if (n >= 0) {
                return n;
            }
        } catch (NumberFormatException e) {
            // reported below
        }
        throw syntax(line, "[" + keyword + "] needs a whole number, found '" + argument + "'");
    }

    private static InvalidSweepException syntax(int line, String message) {
        return new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX, "line " + line + ": " + message);
    }
}
