package org.qfleet.app;

import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.nio.charset.Charset;
import picocli.CommandLine;
import picocli.CommandLine.IExecutionExceptionHandler;
import picocli.CommandLine.IParameterExceptionHandler;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.ParseResult;
import picocli.CommandLine.UnmatchedArgumentException;

/**
 * Entry point of the shaded jar. Exit codes: 0 when every input gave a result, 1 when some did
 * not (or the program failed), 2 for usage errors. Users never see a stack trace unless they ask
 * for one with {@code --debug}.
 */
public final class Main {

    private Main() {
    }

    public static void main(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, Charset.defaultCharset()));
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, Charset.defaultCharset()), true);
        int code;
        try {
            code = execute(args, out, err);
        } catch (Throwable t) {
            // Last resort, e.g. an OutOfMemoryError: one line, no stack trace.
            err.println("qfleet: fatal: " + t);
            code = 1;
        }
        out.flush();
        err.flush();
        System.exit(code);
    }

    /** Runs the command line with the given streams and returns the exit code. */
    static int execute(String[] args, PrintWriter out, PrintWriter err) {
        int code = commandLine(out, err).execute(args);
        out.flush();
        err.flush();
        return code;
    }

    static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        return new CommandLine(new QfleetCommand())
                .setOut(out)
                .setErr(err)
                .setParameterExceptionHandler(new ShortUsageError())
                .setExecutionExceptionHandler(new QuietFailure());
    }

    /** A usage error: the reason, suggestions for a mistyped option, and where to find help. */
    private static final class ShortUsageError implements IParameterExceptionHandler {

        @Override
        public int handleParseException(ParameterException e, String[] args) {
            CommandLine command = e.getCommandLine();
            PrintWriter err = command.getErr();
            err.println(command.getCommandSpec().qualifiedName() + ": " + e.getMessage());
            UnmatchedArgumentException.printSuggestions(e, err);
            err.println("Try '" + command.getCommandSpec().qualifiedName() + " --help' for more information.");
            err.flush();
            return command.getCommandSpec().exitCodeOnInvalidInput();
        }
    }

    /** Turns an exception that escaped a command into one line on stderr and exit code 1. */
    private static final class QuietFailure implements IExecutionExceptionHandler {

        @Override
        public int handleExecutionException(Exception e, CommandLine command, ParseResult parseResult) {
            PrintWriter err = command.getErr();
            err.println(command.getCommandSpec().qualifiedName() + ": " + e);
            if (DebugOption.requested(command.getCommandSpec())) {
                e.printStackTrace(err);
            } else {
                err.println("(rerun with --debug for details)");
            }
            err.flush();
            return 1;
        }
    }
}
