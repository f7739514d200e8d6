package org.qfleet.app;

import java.time.Duration;
import java.time.format.DateTimeParseException;
import java.util.Locale;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads durations such as {@code 30s}, {@code 5m}, {@code 1h}, {@code 90} (seconds) or ISO-8601 {@code PT30S}. */
final class DurationConverter implements ITypeConverter<Duration> {

    @Override
    public Duration convert(String value) {
        String v = value.trim().toLowerCase(Locale.ROOT);
        Duration d;
        try {
            if (v.startsWith("pt") || v.startsWith("p")) {
                d = Duration.parse(v.toUpperCase(Locale.ROOT));
            } else if (v.endsWith("ms")) {
                d = Duration.ofMillis(Long.parseLong(v.substring(0, v.length() - 2)));
            } else if (v.endsWith("s")) {
                d = Duration.ofSeconds(Long.parseLong(v.substring(0, v.length() - 1)));
            } else if (v.endsWith("m")) {
                d = Duration.ofMinutes(Long.parseLong(v.substring(0, v.length() - 1)));
            } else if (v.endsWith("h")) {
                d = Duration.ofHours(Long.parseLong(v.substring(0, v.length() - 1)));
            } else {
                d = Duration.ofSeconds(Long.parseLong(v));
            }
        } catch (NumberFormatException | DateTimeParseException e) {
            throw new TypeConversionException("expected a duration such as 30s, 5m or 1h, got '" + value + "'");
        }
        if (d.isNegative() || d.isZero()) {
            throw new TypeConversionException("expected a positive duration, got '" + value + "'");
        }
        return d;
    }
}
