package org.qfleet.sweep;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.fail;

import java.io.ByteArrayInputStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Random;
import org.junit.jupiter.api.Test;

/**
 * Random, truncated and mutated inputs: the readers may accept or reject them, but must never throw
 * anything except {@link InvalidSweepException}. Seeds are fixed so a failure can be replayed.
 */
class SweepReadersFuzzTest {

    private static final byte[] JSON_ALPHABET =
            "{}[]\":,.-+0123456789eEnulltruefalsNaIfiy re im mag deg db s21 s11 \\u00\t\n\u00e9".getBytes(StandardCharsets.UTF_8);
    private static final String TOUCHSTONE_ALPHABET = "0123456789.-+eE !#[]\nGHzMHzkHzSRIMADBR50 VersionEnd";

    private final SweepJsonReader json = new SweepJsonReader(new SweepLimits(1, 64));
    private final TouchstoneReader touchstone = new TouchstoneReader(new SweepLimits(1, 64));

    @Test
    void everyTruncationOfAValidMessageIsInvalidJson() {
        byte[] message = SweepMessage.valid().with("temperatureC", "21").with("s11", "{\"db\":[-1,-2,-3,-4,-5,-6,-7]}").bytes();
        for (int length = 0; length < message.length; length++) {
            SweepError error = jsonOutcome(Arrays.copyOf(message, length));
            assertThat(error).as("prefix of %d bytes", length).isEqualTo(SweepError.INVALID_JSON);
        }
        assertThat(jsonOutcome(message)).isNull();
    }

    @Test
    void randomBytesNeverEscapeAsAnotherException() {
        Random random = new Random(20240517L);
        for (int i = 0; i < 5000; i++) {
            byte[] bytes = new byte[random.nextInt(200)];
            random.nextBytes(bytes);
            assertThat(jsonOutcome(bytes)).isNotNull();
        }
    }

    @Test
    void mutatedMessagesNeverEscapeAsAnotherException() {
        Random random = new Random(7L);
        byte[] message = SweepMessage.valid().with("s22", "{\"mag\":[1,1,1,1,1,1,1],\"deg\":[0,1,2,3,4,5,6]}").bytes();
        for (int i = 0; i < 5_000; i++) {
            byte[] mutated = mutate(message, random, JSON_ALPHABET);
            jsonOutcome(mutated);
            if (i % 10 == 0) {
                streamOutcome(mutated);
            }
        }
    }

    @Test
    void mutatedTouchstoneFilesNeverEscapeAsAnotherException() {
        Random random = new Random(11L);
        String[] seeds = {
            "! two-port\n# GHz S RI R 50\n1 0.1 0.2 0.3 0.4 0.5 0.6 0.7 0.8\n2 0.1 0.2 0.3 0.4 0.5 0.6 0.7 0.8\n"
                    + "1.5 1 2 3 4\n",
            "[Version] 2.0\n# MHz S DB R 50\n[Number of Ports] 2\n[Two-Port Data Order] 12_21\n"
                    + "[Number of Frequencies] 2\n[Reference] 50\n50\n[Network Data]\n1 -1 0 -2 0 -3 0 -4 0\n"
                    + "2 -1 0 -2 0\n -3 0 -4 0\n[End]\n"};
        byte[] alphabet = TOUCHSTONE_ALPHABET.getBytes(StandardCharsets.ISO_8859_1);
        for (int i = 0; i < 5_000; i++) {
            byte[] seed = seeds[i % 2].getBytes(StandardCharsets.ISO_8859_1);
            String text = new String(mutate(seed, random, alphabet), StandardCharsets.ISO_8859_1);
            try {
                touchstone.read("fuzz.s2p", new StringReader(text), random.nextInt(4));
            } catch (InvalidSweepException e) {
                assertThat(e.getMessage()).isNotBlank();
            } catch (RuntimeException e) {
                fail("escaped on input:\n" + text, e);
            }
        }
    }

    private static byte[] mutate(byte[] seed, Random random, byte[] alphabet) {
        byte[] bytes = seed.clone();
        int edits = 1 + random.nextInt(4);
        for (int e = 0; e < edits; e++) {
            int at = random.nextInt(bytes.length + 1);
            switch (random.nextInt(4)) {
                case 0 -> { // replace
                    if (at < bytes.length) {
                        bytes[at] = alphabet[random.nextInt(alphabet.length)];
                    }
                }
                case 1 -> { // insert
                    byte[] longer = new byte[bytes.length + 1];
                    System.arraycopy(bytes, 0, longer, 0, at);
                    longer[at] = alphabet[random.nextInt(alphabet.length)];
                    System.arraycopy(bytes, at, longer, at + 1, bytes.length - at);
                    bytes = longer;
                }
                case 2 -> { // delete
                    if (at < bytes.length) {
                        byte[] shorter = new byte[bytes.length - 1];
                        System.arraycopy(bytes, 0, shorter, 0, at);
                        System.arraycopy(bytes, at + 1, shorter, at, bytes.length - at - 1);
                        bytes = shorter;
                    }
                }
                default -> bytes = Arrays.copyOf(bytes, at); // truncate
            }
        }
        return bytes;
    }

    /** The error code, or null when the input was accepted; fails on any other exception. */
    private SweepError jsonOutcome(byte[] bytes) {
        try {
            json.read("fuzz", bytes);
            return null;
        } catch (InvalidSweepException e) {
            assertThat(e.getMessage()).isNotBlank();
            return e.error();
        } catch (RuntimeException e) {
            return fail("escaped on input: " + new String(bytes, StandardCharsets.ISO_8859_1), e);
        }
    }

    private void streamOutcome(byte[] bytes) {
        try {
            json.read("fuzz", new ByteArrayInputStream(bytes));
        } catch (InvalidSweepException e) {
            assertThat(e.error()).isNotEqualTo(SweepError.UNREADABLE);
        } catch (RuntimeException e) {
            fail("escaped on input: " + new String(bytes, StandardCharsets.ISO_8859_1), e);
        }
    }
}
