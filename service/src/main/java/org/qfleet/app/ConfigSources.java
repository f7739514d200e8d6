package org.qfleet.app;

import java.io.IOException;
import java.io.Reader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.Properties;

/**
 * Where the service's settings come from, merged in order of precedence: command-line options
 * over environment variables ({@code QFLEET_*}) over a properties file. Keys are those of the
 * properties file ({@code bootstrap.servers}, {@code topic.sweeps}, {@code kafka.security.protocol}, ...);
 * an environment variable names a key in upper case with dots as underscores
 * ({@code QFLEET_BOOTSTRAP_SERVERS}, {@code QFLEET_KAFKA_SECURITY_PROTOCOL}).
 */
final class ConfigSources {

    static final String ENV_PREFIX = "QFLEET_";

    private ConfigSources() {
    }

    /**
     * The merged settings.
     *
     * @param file        a properties file, or null
     * @param environment the process environment
     * @param options     settings given on the command line
     */
    static Map<String, Setting> merge(Path file, Map<String, String> environment, Map<String, String> options)
            throws ConfigException {
        Map<String, Setting> merged = new LinkedHashMap<>();
        if (file != null) {
            readFile(file).forEach((k, v) -> merged.put(k, new Setting(v, file.toString())));
        }
        fromEnvironment(environment).forEach((k, v) -> merged.put(k, new Setting(v, "environment variable " + envName(k))));
        options.forEach((k, v) -> merged.put(k, new Setting(v, "command line")));
        return merged;
    }

    /** A value and where it came from, to name it in error messages. */
    record Setting(String value, String origin) {
    }

    static Map<String, String> readFile(Path file) throws ConfigException {
        Properties properties = new Properties();
        try (Reader in = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            properties.load(in);
        } catch (IOException | IllegalArgumentException e) {
            throw new ConfigException("cannot read the configuration file " + file + ": " + e.getMessage());
        }
        Map<String, String> values = new LinkedHashMap<>();
        for (String key : properties.stringPropertyNames()) {
            values.put(key.trim(), properties.getProperty(key).trim());
        }
        return values;
    }

    static Map<String, String> fromEnvironment(Map<String, String> environment) {
        Map<String, String> values = new LinkedHashMap<>();
        environment.forEach((name, value) -> {
            if (name.startsWith(ENV_PREFIX) && name.length() > ENV_PREFIX.length()) {
                values.put(name.substring(ENV_PREFIX.length()).toLowerCase(Locale.ROOT).replace('_', '.'), value.trim());
            }
        });
        return values;
    }

    static String envName(String key) {
        return ENV_PREFIX + key.toUpperCase(Locale.ROOT).replace('.', '_').replace('-', '_');
    }
}
