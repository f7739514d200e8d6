package org.qfleet.app;

import java.util.Arrays;
import java.util.Iterator;
import org.qfleet.codec.TraceForm;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads {@code --form} values: {@code re-im}, {@code mag-deg}, {@code db-deg}, {@code db}. */
final class TraceFormConverter implements ITypeConverter<TraceForm> {

    @Override
    public TraceForm convert(String value) {
        return Arrays.stream(TraceForm.values()).filter(f -> f.code().equals(value)).findFirst()
                .orElseThrow(() -> new TypeConversionException("expected one of " + new Names() + ", got '" + value + "'"));
    }

    /** The codes, for help texts and completion. */
    static final class Names implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            return Arrays.stream(TraceForm.values()).map(TraceForm::code).iterator();
        }

        @Override
        public String toString() {
            return String.join(", ", this);
        }
    }
}
