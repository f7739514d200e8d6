package org.qfleet.sweep;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.StreamReadFeature;
import java.io.CharConversionException;
import java.io.IOException;
import java.io.InputStream;
import java.io.Reader;

/**
 * Reads sweep messages (the JSON contract of the sweeps topic) with a streaming parser straight
 * into primitive arrays. Strict: standard JSON only (no NaN or Infinity tokens), every required
 * field present and well typed, no duplicate fields, nothing after the object, and no array longer
 * than {@link SweepLimits#maxPoints()} (reading stops as soon as one is). Unknown fields are
 * skipped. The result is validated with {@link SweepValidator}. Thread-safe.
 *
 * <p>Messages given as bytes are first tried by {@link SweepBytesReader}, which reads the plain,
 * well-formed common case more than twice as fast and gives up on anything else; the streaming parser
 * then reads the message, so results and errors are the same whichever path read it.
 */
public final class SweepJsonReader {

    private static final JsonFactory FACTORY = JsonFactory.builder()
            .enable(StreamReadFeature.USE_FAST_DOUBLE_PARSER)
            .disable(StreamReadFeature.INCLUDE_SOURCE_IN_LOCATION)
            .disable(StreamReadFeature.AUTO_CLOSE_SOURCE)
            .build();
    private static final int MAX_MESSAGE_SHOWN = 160;
    private static final String[] PARSER_HINTS = {" (start marker at", ": enable `", " at [Source"};

    private final SweepLimits limits;

    public SweepJsonReader() {
        this(SweepLimits.DEFAULT);
    }

    public SweepJsonReader(SweepLimits limits) {
        this.limits = limits;
    }

    /** Reads one message from its bytes (UTF-8, or another JSON encoding detected from them). */
    public Sweep read(String source, byte[] json) throws InvalidSweepException {
        SweepMessageFields plain = SweepBytesReader.read(json, limits.maxPoints());
        if (plain != null) {
            try {
                return plain.build(source, limits);
            } catch (InvalidSweepException e) {
                throw withSweepId(e, plain);
            }
        }
        return readWithParser(source, json);
    }

    /** Reads bytes with the streaming parser alone, as {@link #read(String, byte[])} does when the fast path gives up. */
    Sweep readWithParser(String source, byte[] json) throws InvalidSweepException {
        try {
            return read(source, FACTORY.createParser(json));
        } catch (IOException e) {
            throw invalidJson(e);
        }
    }

    /** Reads one message from a stream, which is read up to the end of the message and not closed. */
    public Sweep read(String source, InputStream json) throws InvalidSweepException {
        try {
            return read(source, FACTORY.createParser(json));
        } catch (IOException e) {
            throw invalidJson(e);
        }
    }

    /** Reads one message from text, which is read up to the end of the message and not closed. */
    public Sweep read(String source, Reader json) throws InvalidSweepException {
        try {
            return read(source, FACTORY.createParser(json));
        } catch (IOException e) {
            throw invalidJson(e);
        }
    }

    private Sweep read(String source, JsonParser parser) throws IOException, InvalidSweepException {
        SweepMessageFields fields = new SweepMessageFields();
        try (parser) {
            new SweepMessageParser(parser, fields, limits.maxPoints()).parse();
            return fields.build(source, limits);
        } catch (InvalidSweepException e) {
            throw withSweepId(e, fields);
        } catch (IOException e) {
            throw withSweepId(invalidJson(e), fields);
        }
    }

    /** The error, naming the message's sweep when its sweepId was read before the error. */
    private static InvalidSweepException withSweepId(InvalidSweepException e, SweepMessageFields fields) {
        return fields.sweepId() == null ? e : e.withSweepId(fields.sweepId());
    }

    private static InvalidSweepException invalidJson(IOException e) {
        if (e instanceof JsonProcessingException json) {
            JsonLocation at = json.getLocation();
            String where = at == null || at.getLineNr() < 0 ? ""
                    : " at line " + at.getLineNr() + ", column " + at.getColumnNr();
            return new InvalidSweepException(SweepError.INVALID_JSON, "invalid JSON" + where + ": "
                    + oneLine(json.getOriginalMessage()), e);
        }
        if (e instanceof CharConversionException) {
            return new InvalidSweepException(SweepError.INVALID_JSON, "invalid JSON: " + oneLine(e.getMessage()), e);
        }
        return new InvalidSweepException(SweepError.UNREADABLE, "cannot read the message: " + oneLine(e.getMessage()), e);
    }

    /** The parser's message on one line, without its hints about parser settings. */
    private static String oneLine(String message) {
        String text = String.valueOf(message).replace('\n', ' ').replace('\r', ' ')
                .replaceAll(", from `[^`]*`\\)", ")");
        for (String hint : PARSER_HINTS) {
            int at = text.indexOf(hint);
            text = at > 0 ? text.substring(0, at) : text;
        }
        return text.length() <= MAX_MESSAGE_SHOWN ? text : text.substring(0, MAX_MESSAGE_SHOWN) + "...";
    }
}
