package org.qfleet.stream;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonGenerator;
import com.fasterxml.jackson.core.json.JsonWriteFeature;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;
import java.util.Base64;

/**
 * Writes reject messages ({@code schemas/reject.schema.json}): the reason, the source record's
 * coordinates and its original bytes, base64-encoded and cut to a bound so that a huge bad input
 * cannot make a huge reject. Thread-safe.
 */
public final class RejectJson {

    /** Keys longer than this are cut; lot ids are far shorter. */
    static final int MAX_KEY_CHARS = 256;

    private final JsonFactory factory = JsonFactory.builder().enable(JsonWriteFeature.ESCAPE_NON_ASCII).build();
    private final int maxPayloadBytes;

    /** @param maxPayloadBytes most bytes of the original value kept in a reject */
    public RejectJson(int maxPayloadBytes) {
        if (maxPayloadBytes < 0) {
            throw new IllegalArgumentException("maxPayloadBytes must not be negative, got " + maxPayloadBytes);
        }
        this.maxPayloadBytes = maxPayloadBytes;
    }

    public byte[] write(Reject reject) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(256 + 4 * Math.min(maxPayloadBytes, length(reject.payload())) / 3);
        try (JsonGenerator g = factory.createGenerator(out)) {
            g.writeStartObject();
            g.writeStringField("code", reject.code());
            g.writeStringField("error", reject.message() == null || reject.message().isBlank() ? "unknown error" : reject.message());
            if (reject.sweepId() != null) {
                g.writeStringField("sweepId", reject.sweepId());
            }
            g.writeStringField("topic", reject.topic());
            g.writeNumberField("partition", reject.partition());
            g.writeNumberField("offset", reject.offset());
            String key = keyText(reject.key());
            if (key != null) {
                g.writeStringField("key", key);
            }
            byte[] payload = reject.payload();
            if (payload == null) {
                g.writeNullField("payloadBase64");
                g.writeNumberField("payloadBytes", 0);
                g.writeBooleanField("payloadTruncated", false);
            } else {
                int kept = Math.min(payload.length, maxPayloadBytes);
                g.writeStringField("payloadBase64", Base64.getEncoder().encodeToString(Arrays.copyOf(payload, kept)));
                g.writeNumberField("payloadBytes", payload.length);
                g.writeBooleanField("payloadTruncated", kept < payload.length);
            }
            g.writeEndObject();
        } catch (IOException e) {
            throw new UncheckedIOException("cannot write JSON to memory", e);
        }
        return out.toByteArray();
    }

    /** The key as text when it is UTF-8 (lot ids are), cut to a bound; null for no key or binary keys. */
    static String keyText(byte[] key) {
        if (key == null) {
            return null;
        }
        try {
            String text = StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(key)).toString();
            return text.length() <= MAX_KEY_CHARS ? text : text.substring(0, MAX_KEY_CHARS);
        } catch (CharacterCodingException e) {
            return null;
        }
    }

    private static int length(byte[] bytes) {
        return bytes == null ? 0 : bytes.length;
    }
}
