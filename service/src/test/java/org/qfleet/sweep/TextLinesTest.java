package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.Reader;
import java.io.StringReader;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Lines must come out the same whether the text is held whole or read in windows, whatever chunks
 * the reader delivers and wherever a CR LF pair falls.
 */
class TextLinesTest {

    private static final int SMALL_WINDOW = TextLines.MAX_LINE_LENGTH + 1;

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4})
    void splitsAtEveryKindOfLineBreakWholeOrInWindows(long seed) throws Exception {
        String text = randomText(new SplittableRandom(seed), 400_000);
        List<String> expected = referenceLines(text);

        assertThat(read(new StringReader(text), text.length(), TextLines.WHOLE_TEXT, false)).isEqualTo(expected);
        assertThat(read(new Trickle(text, seed), -1, SMALL_WINDOW, false)).isEqualTo(expected);
        assertThat(read(new Trickle(text, seed), 100, SMALL_WINDOW + 999, true)).isEqualTo(expected);
        assertThat(read(new Trickle(text, seed), -1, TextLines.WHOLE_TEXT, true)).isEqualTo(expected);
    }

    @ParameterizedTest
    @ValueSource(strings = {"", "a", "a\n", "a\r", "a\r\n", "\n", "\r\n\r\n", "\n\r", "a\n\nb", "a\rb\r\nc\n\rd", "x\r\r\n"})
    void keepsTheEndsOfShortTexts(String text) throws Exception {
        List<String> expected = referenceLines(text);

        assertThat(read(new StringReader(text), text.length(), TextLines.WHOLE_TEXT, false)).isEqualTo(expected);
        assertThat(read(new Trickle(text, 9), -1, SMALL_WINDOW, true)).isEqualTo(expected);
    }

    /** The window ends right before, on or after the CR of a CR LF pair. */
    @ParameterizedTest
    @ValueSource(ints = {-2, -1, 0, 1, 2})
    void joinsACrLfPairThatTheWindowSplits(int shift) throws Exception {
        String text = "a\n" + "x".repeat(SMALL_WINDOW - 3 + shift) + "\r\n" + "b\r\rc\r";
        List<String> expected = referenceLines(text);

        assertThat(read(new StringReader(text), -1, SMALL_WINDOW, false)).isEqualTo(expected);
        assertThat(read(new StringReader(text), -1, SMALL_WINDOW, true)).isEqualTo(expected);
    }

    @ParameterizedTest
    @ValueSource(ints = {TextLines.WHOLE_TEXT, SMALL_WINDOW})
    void takesALineOfTheLongestLengthAndRefusesOneCharacterMore(int window) throws Exception {
        String longest = "a\n" + "x".repeat(TextLines.MAX_LINE_LENGTH) + "\r\nb";
        assertThat(read(new Trickle(longest, 5), -1, window, false)).hasSize(3);

        String tooLong = "a\nb\n" + "x".repeat(TextLines.MAX_LINE_LENGTH + 1) + "\nc";
        assertThatThrownBy(() -> read(new Trickle(tooLong, 5), -1, window, false))
                .isInstanceOf(InvalidSweepException.class)
                .hasMessage("line 3 is longer than " + TextLines.MAX_LINE_LENGTH + " characters");
    }

    /**
     * Reads every line; each line's end is found by {@link TextLines#end()} or, when {@code fromInside},
     * by {@link TextLines#endFrom(int)} from a point inside the line, as a reader of the line would.
     */
    private static List<String> read(Reader in, long length, int window, boolean fromInside)
            throws IOException, InvalidSweepException {
        TextLines lines = new TextLines(in, length, window);
        List<String> result = new ArrayList<>();
        while (lines.next()) {
            assertThat(lines.lineNumber()).isEqualTo(result.size() + 1);
            int end;
            if (fromInside) {
                int inside = lines.start();
                while (inside < lines.bound() && lines.text()[inside] != '\n' && lines.text()[inside] != '\r'
                        && inside - lines.start() < 3) {
                    inside++;
                }
                end = lines.endFrom(inside);
            } else {
                end = lines.end();
            }
            result.add(new String(lines.text(), lines.start(), end - lines.start()));
        }
        return result;
    }

    /** Lines as LF, CR LF and CR split them; text after the last break is a line, an empty end is not. */
    private static List<String> referenceLines(String text) {
        List<String> lines = new ArrayList<>();
        int start = 0;
        for (int i = 0; i < text.length(); i++) {
            char c = text.charAt(i);
            if (c == '\n' || c == '\r') {
                lines.add(text.substring(start, i));
                if (c == '\r' && i + 1 < text.length() && text.charAt(i + 1) == '\n') {
                    i++;
                }
                start = i + 1;
            }
        }
        if (start < text.length()) {
            lines.add(text.substring(start));
        }
        return lines;
    }

    /** Lines of random length (some empty, some long), random breaks, tabs and blanks. */
    private static String randomText(SplittableRandom random, int length) {
        StringBuilder text = new StringBuilder(length + 100);
        String[] breaks = {"\n", "\r\n", "\r", "\n\n", "\r\n\r\n"};
        while (text.length() < length) {
            int lineLength = random.nextInt(8) == 0 ? random.nextInt(20_000) : random.nextInt(120);
            for (int k = 0; k < lineLength; k++) {
                int kind = random.nextInt(20);
                text.append(kind == 0 ? '\t' : kind == 1 ? ' ' : (char) ('0' + random.nextInt(10)));
            }
            text.append(breaks[random.nextInt(breaks.length)]);
        }
        return text.toString();
    }

    /** A reader that hands out the text in chunks of random size, as a pipe or a slow file might. */
    private static final class Trickle extends Reader {

        private final String text;
        private final SplittableRandom random;
        private int position;

        Trickle(String text, long seed) {
            this.text = text;
            this.random = new SplittableRandom(seed);
        }

        @Override
        public int read(char[] target, int offset, int length) {
            if (position == text.length()) {
                return -1;
            }
            int count = Math.min(Math.min(length, text.length() - position), 1 + random.nextInt(5000));
            text.getChars(position, position + count, target, offset);
            position += count;
            return count;
        }

        @Override
        public void close() {
            // nothing to release
        }
    }
}
