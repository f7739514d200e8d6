package org.qfleet.app;

import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/** The top command, {@code qfleet}; it only dispatches to its subcommands. */
@Command(name = "qfleet",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = "Resonator f0, loaded and unloaded Q and coupling from network-analyzer sweeps.",
        subcommands = {FitCommand.class, RunCommand.class, DemoCommand.class, SimulateCommand.class, BenchCommand.class},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {
            "0:success",
            "1:some input failed, or an unexpected error",
            "2:usage error"})
final class QfleetCommand implements Callable<Integer> {

    @Spec
    CommandSpec spec;

    @Override
    public Integer call() {
        throw new ParameterException(spec.commandLine(), "Missing command: choose one of " + spec.subcommands().keySet());
    }
}
