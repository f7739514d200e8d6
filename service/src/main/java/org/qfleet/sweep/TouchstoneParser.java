package org.qfleet.sweep;

import java.io.IOException;
import java.util.Locale;

/**
 * Reads one Touchstone file line by line (the state of one {@link TouchstoneReader#read} call),
 * data lines in place, without a String for each. Follows the Touchstone File Format
 * Specification, versions 1.1 (EIA/IBIS Open Forum, 2002) and 2.0 (IBIS Open Forum, 2009), as
 * recalled from memory: {@code !} starts a comment anywhere, the option line starts with {@code #},
 * 2.0 keywords are in brackets and a 2.0 file starts with [Version] 2.0. Noise data is checked for
 * shape and otherwise ignored.
 */
final class TouchstoneParser {

    private static final int NOISE_NUMBERS = 5;

    private enum Section { HEADER, INFORMATION, NETWORK, NOISE, END }

    private final String source;
    private final TextLines lines;
    private final SweepLimits limits;
    private final int portsFromExtension;
    private final NumberTokens numbers = new NumberTokens();
    private final TouchstoneKeywords keywords;
    private boolean version2;
    private Section section = Section.HEADER;
    private TouchstoneOptions options;
    private boolean optionLineSeen;
    private NetworkData network;
    private int ports;
    private boolean noiseSeen;
    private int noiseStartLine;
    private int noiseCount;

    TouchstoneParser(String source, TextLines lines, SweepLimits limits, int portsFromExtension) {
        this.source = source;
        this.lines = lines;
        this.limits = limits;
        this.portsFromExtension = portsFromExtension;
        this.keywords = new TouchstoneKeywords(limits);
    }

    Sweep parse() throws IOException, InvalidSweepException {
        boolean first = true;
        while (lines.next()) {
            if (section == Section.END) {
                lines.end(); // the line after [End] is read, and refused when too long, as any line
                break;
            }
            char[] text = lines.text();
            int start = contentStart(text, lines.start(), lines.bound());
            if (start == lines.bound() || isLineBreak(text[start]) || text[start] == '!') {
                continue;
            }
            int number = lines.lineNumber();
            if (first) {
                first = false;
                if (keywordName(text, start).equalsIgnoreCase("version")) {
                    version(content(text, start), number);
                    continue;
                }
            }
            if (section == Section.INFORMATION) {
                if (keywordName(text, start).equalsIgnoreCase("end information")) {
                    section = Section.HEADER;
                }
                continue;
            }
            switch (text[start]) {
                case '#' -> optionLine(content(text, start), number);
                case '[' -> keyword(content(text, start), number);
                default -> data(text, start, number);
            }
        }
        return finish();
    }

    private void version(String line, int number) throws InvalidSweepException {
        String version = line.substring(line.indexOf(']') + 1).trim();
        if (!version.equals("2.0") && !version.equals("2.1")) {
            throw syntax(number, "unsupported [Version] '" + version + "' (expected 2.0)");
        }
        version2 = true;
    }

    private void optionLine(String line, int number) throws InvalidSweepException {
        if (section != Section.HEADER && !optionLineSeen) {
            throw syntax(number, "the option line must come before the data");
        }
        if (optionLineSeen && !version2) {
            return; // Touchstone 1.1: option lines after the first are ignored
        }
        if (optionLineSeen) {
            throw syntax(number, "a second option line");
        }
        optionLineSeen = true;
        options = TouchstoneOptions.parse(line, number);
    }

    private void keyword(String line, int number) throws InvalidSweepException {
        if (line.indexOf(']') < 0) {
            throw syntax(number, "keyword without a closing ']'");
        }
        String name = keywordName(line);
        if (!version2) {
            throw syntax(number, "keyword [" + name + "] in a file without [Version] 2.0 on its first line");
        }
        String argument = line.substring(line.indexOf(']') + 1).trim();
        switch (name.toLowerCase(Locale.ROOT)) {
            case "version" -> throw syntax(number, "[Version] must be the first line");
            case "network data" -> startNetwork(number);
            case "noise data" -> startNoise(number);
            case "end" -> {
                endNetwork();
                section = Section.END;
            }
            case "begin information" -> {
                requireHeader(name, number);
                section = Section.INFORMATION;
            }
            case "end information" -> throw syntax(number, "[End Information] without [Begin Information]");
            default -> {
                requireHeader(name, number);
                keywords.apply(name, argument, number, numbers);
            }
        }
    }

    private void startNetwork(int number) throws InvalidSweepException {
        requireHeader("Network Data", number);
        keywords.checkComplete(number);
        ports = keywords.ports();
        network = newNetworkData(keywords.order(), keywords.frequencies(), false);
        section = Section.NETWORK;
    }

    private void startNoise(int number) throws InvalidSweepException {
        if (section != Section.NETWORK) {
            throw syntax(number, "[Noise Data] must follow [Network Data]");
        }
        if (ports != 2) {
            throw syntax(number, "noise data is only defined for 2-port files");
        }
        if (keywords.noiseFrequencies() < 0) {
            throw syntax(number, "[Noise Data] needs [Number of Noise Frequencies] in the header");
        }
        endNetwork();
        section = Section.NOISE;
        noiseSeen = true;
        noiseStartLine = number;
    }

    private void data(char[] text, int start, int number) throws InvalidSweepException {
        int count;
        try {
            count = numbers.parse(text, start, lines.bound(), number);
        } catch (InvalidSweepException e) {
            lines.end(); // a line too long is reported as such, whatever else is wrong with it
            throw e;
        }
        lines.endFrom(numbers.stop());
        if (section == Section.HEADER) {
            if (version2 && keywords.expectsReferenceValues()) {
                keywords.addReferenceValues(numbers.values(), count, number);
                return;
            }
            if (version2) {
                throw syntax(number, "data before [Network Data]");
            }
            startVersion1Data(number);
        }
        if (section == Section.NETWORK && network.add(numbers.values(), count, number)) {
            return;
        }
        if (section == Section.NETWORK) {
            endNetwork();
            section = Section.NOISE;
            noiseSeen = true;
            noiseStartLine = number;
        }
        noiseLine(count, number);
    }

    private void startVersion1Data(int number) throws InvalidSweepException {
        if (portsFromExtension == 0) {
            throw syntax(number, "the number of ports is unknown: a Touchstone 1.1 file needs a .s1p or .s2p"
                    + " name, a 2.0 file a [Number of Ports] keyword");
        }
        if (portsFromExtension > 2) {
            throw new InvalidSweepException(SweepError.UNSUPPORTED_PARAMETER,
                    portsFromExtension + "-port data is not supported, only 1- and 2-port files");
        }
        ports = portsFromExtension;
        SParameter[] order = ports == 1
                ? new SParameter[] {SParameter.S11}
                : new SParameter[] {SParameter.S11, SParameter.S21, SParameter.S12, SParameter.S22};
        network = newNetworkData(order, -1, ports == 2);
        section = Section.NETWORK;
    }

    private NetworkData newNetworkData(SParameter[] order, int declared, boolean noiseMayFollow) {
        if (options == null) {
            options = TouchstoneOptions.DEFAULT;
        }
        return new NetworkData(order, options, limits.maxPoints(), declared, noiseMayFollow);
    }

    private void noiseLine(int count, int number) throws InvalidSweepException {
        if (count != NOISE_NUMBERS) {
            throw syntax(number, "expected " + NOISE_NUMBERS + " numbers per noise frequency, found " + count
                    + (version2 ? "" : " (noise data starts on line " + noiseStartLine
                            + ", where the frequency stops increasing)"));
        }
        noiseCount++;
    }

    private void endNetwork() throws InvalidSweepException {
        if (section == Section.NETWORK) {
            network.finish();
        }
    }

    private Sweep finish() throws InvalidSweepException {
        endNetwork();
        if (network == null || network.count() == 0) {
            throw new InvalidSweepException(SweepError.EMPTY_ARRAY, "no network data: the file has no frequencies");
        }
        double referenceOhms = options.referenceOhms();
        if (version2) {
            checkDeclaredCounts();
            referenceOhms = keywords.referenceOhms(referenceOhms);
        }
        Sweep sweep = new Sweep(source, SweepInfo.NONE, null, network.frequencyHz(), network.traces(), referenceOhms);
        SweepValidator.validate(sweep, limits);
        return sweep;
    }

    private void checkDeclaredCounts() throws InvalidSweepException {
        if (network.count() != keywords.frequencies()) {
            throw syntax(keywords.frequenciesLine(), "[Number of Frequencies] is " + keywords.frequencies()
                    + " but the network data has " + network.count());
        }
        int declaredNoise = Math.max(keywords.noiseFrequencies(), 0);
        if (noiseCount != declaredNoise) {
            throw new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX, "[Number of Noise Frequencies] is "
                    + declaredNoise + " but " + (noiseSeen ? "the noise data has " + noiseCount : "there is no [Noise Data]"));
        }
    }

    private void requireHeader(String keyword, int number) throws InvalidSweepException {
        if (section != Section.HEADER) {
            throw syntax(number, "[" + keyword + "] must come before the data and appear once");
        }
    }

    /** The name between the brackets of a keyword line, or "" when the line is not a whole keyword. */
    private static String keywordName(String line) {
        int close = line.indexOf(']');
        return line.charAt(0) != '[' || close < 0 ? "" : line.substring(1, close).trim();
    }

    /** {@link #keywordName(String)} of the current line, whose content starts at {@code text[start]}. */
    private String keywordName(char[] text, int start) throws InvalidSweepException {
        return text[start] != '[' ? "" : keywordName(content(text, start));
    }

    /**
     * The current line, whose content starts at {@code text[start]}, without its {@code !} comment
     * and the blanks around (as String.trim).
     */
    private String content(char[] text, int start) throws InvalidSweepException {
        int end = lines.end();
        int stop = start;
        while (stop < end && text[stop] != '!') {
            stop++;
        }
        while (stop > start && text[stop - 1] <= ' ') {
            stop--;
        }
        return new String(text, start, stop - start);
    }

    /** Where the line's content starts: after blanks, at its line break or at {@code bound}. */
    private static int contentStart(char[] text, int start, int bound) {
        int from = start;
        while (from < bound && text[from] <= ' ' && !isLineBreak(text[from])) {
            from++;
        }
        return from;
    }

    private static boolean isLineBreak(char c) {
        return c == '\n' || c == '\r';
    }

    private static InvalidSweepException syntax(int line, String message) {
        return new InvalidSweepException(SweepError.TOUCHSTONE_SYNTAX, "line " + line + ": " + message);
    }
}
