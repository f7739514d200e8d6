package org.qfleet.app;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.Locale;
import org.qfleet.fit.FitOptions;
import org.qfleet.fit.Method;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/**
 * Reads {@code --method} values: {@code auto} lets the engine choose (complex circle when the data
 * carry phase, Lorentzian otherwise), any other value is a {@link Method} code and forces that estimator.
 */
final class MethodConverter implements ITypeConverter<FitOptions> {

    static final String AUTO = "auto";

    @Override
    public FitOptions convert(String value) {
        String name = value.toLowerCase(Locale.ROOT);
        if (name.equals(AUTO)) {
            return FitOptions.AUTOMATIC;
        }
        for (Method method : Method.values()) {
            if (method.code().equals(name)) {
                return new FitOptions(method);
            }
        }
        throw new TypeConversionException("expected one of " + String.join(", ", new Names()) + " but got '" + value + "'");
    }

    /** The accepted values, strongest estimator first, for help and shell completion. */
    static final class Names implements Iterable<String> {

        @Override
        public Iterator<String> iterator() {
            List<String> names = new ArrayList<>(List.of(AUTO));
            Method[] methods = Method.values(); // declared weakest first
            for (int i = methods.length - 1; i >= 0; i--) {
                names.add(methods[i].code());
            }
            return names.iterator();
        }
    }
}
