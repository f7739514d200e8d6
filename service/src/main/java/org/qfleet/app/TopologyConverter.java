package org.qfleet.app;

import java.util.Arrays;
import java.util.Iterator;
import java.util.Locale;
import org.qfleet.sweep.Topology;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Reads {@code --topology} values by their wire names: transmission, notch, reflection. */
final class TopologyConverter implements ITypeConverter<Topology> {

    @Override
    public Topology convert(String value) {
        return Topology.fromWireName(value.toLowerCase(Locale.ROOT)).orElseThrow(() -> new TypeConversionException(
                "expected one of " + String.join(", ", new Names()) + " but got '" + value + "'"));
    }

    /** The accepted values, for help and shell completion. */
    static final class Names implements Iterable<String> {

        @Override
        public Iterator<String> iterator() {
            return Arrays.stream(Topology.values()).map(Topology::wireName).iterator();
        }
    }
}
