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
        SweepMessageParser message = new SweepMessageParser(source, parser, limits);
        try (parser) {
            return message.parse();
        } catch (InvalidSweepException e) {
            throw message.sweepId() == null ? e : e.withSweepId(message.sweepId());
        } catch (IOException e) {
            InvalidSweepException invalid = invalidJson(e);
            throw message.sweepId() == null ? invalid : invalid.withSweepId(message.sweepId());
        }
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
