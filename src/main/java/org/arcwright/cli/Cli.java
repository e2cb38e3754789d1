package org.arcwright.cli;

import java.io.PrintWriter;
import org.arcwright.io.InputProblem;
import picocli.CommandLine;

/**
 * Builds the picocli command line with Arcwright's exit-code conventions and runs it.
 */
public final class Cli {
    /** Done, or the part passes. */
    public static final int OK = 0;
    /** A verdict of fail (inspection, pack check). */
    public static final int FAIL = 1;
    /** Bad input or usage. */
    public static final int BAD_INPUT = 2;
    /** An inspection verdict neither pass nor fail can be proven (measurement uncertainty straddles a limit). */
    public static final int INDETERMINATE = 3;

    private Cli() {}

    /** A number option in the one decimal syntax ({@link org.arcwright.io.DecimalText}): no 1.5f, 0x1p1 or NaN. */
    private static Double decimal(String text) {
        try {
            return org.arcwright.io.DecimalText.parseFinite(text);
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException(e.getMessage());
        }
    }

    /** A configured command line writing to the given streams. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        CommandLine cl = new CommandLine(new ArcwrightCommand());
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.registerConverter(Double.class, Cli::decimal);
        cl.registerConverter(double.class, Cli::decimal);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            Throwable t = ex;
            while (!(t instanceof InputProblem) && t.getCause() != null && t.getCause() != t) t = t.getCause();
            if (t instanceof InputProblem p) {
                commandLine.getErr().println("arcwright " + commandLine.getCommandName() + ": " + p.getMessage());
                return BAD_INPUT;
            }
            if (ex instanceof java.io.UncheckedIOException || ex instanceof java.io.IOException) {
                commandLine.getErr().println("arcwright " + commandLine.getCommandName() + ": " + ex.getMessage());
                return BAD_INPUT;
            }
            throw ex;
        });
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println("arcwright: " + ex.getMessage());
            if (!CommandLine.UnmatchedArgumentException.printSuggestions(ex, c.getErr())) {
                c.getErr().println("Try 'arcwright " + (c.getCommandName().equals("arcwright") ? "" : c.getCommandName() + " ")
                        + "--help' for usage.");
            }
            return BAD_INPUT;
        });
        return cl;
    }

    /** Runs the command line on {@code args} with the process's streams; returns the exit code. */
    public static int run(String[] args) {
        PrintWriter out = new PrintWriter(new java.io.OutputStreamWriter(System.out, java.nio.charset.StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new java.io.OutputStreamWriter(System.err, java.nio.charset.StandardCharsets.UTF_8), true);
        int code = commandLine(out, err).execute(args);
        out.flush();
        err.flush();
        return code;
    }
}
