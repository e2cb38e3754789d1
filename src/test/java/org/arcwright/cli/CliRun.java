package org.arcwright.cli;

import java.io.PrintWriter;
import java.io.StringWriter;

/**
 * Runs the command line in-process, as {@link Cli#run} builds it for the arguments (only the command
 * they name registered), and keeps what it printed.
 */
public record CliRun(int exitCode, String out, String err) {

    public static CliRun of(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        int code = Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true), args).execute(args);
        return new CliRun(code, out.toString(), err.toString());
    }
}
