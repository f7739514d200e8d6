package org.qfleet.app;

import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Model.OptionSpec;
import picocli.CommandLine.Option;

/** The {@code --debug} option shared by the commands: stack traces on stderr for unexpected failures. */
final class DebugOption {

    static final String NAME = "--debug";

    @Option(names = NAME, description = "On an unexpected failure, also print the stack trace on stderr.")
    boolean enabled;

    /** Whether {@code --debug} was given to the command described by {@code spec}. */
    static boolean requested(CommandSpec spec) {
        OptionSpec option = spec.findOption(NAME);
        return option != null && Boolean.TRUE.equals(option.getValue());
    }
}
