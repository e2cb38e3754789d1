package org.arcwright.cli;

import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.List;
import org.arcwright.io.DecimalText;
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
    /**
     * A fault in Arcwright itself, never in the input (the BSD {@code EX_SOFTWARE} code): kept apart
     * from 1 so that a crash is never read as a verdict of fail.
     */
    public static final int INTERNAL_ERROR = 70;
    /** The option, inherited by every command, that shows an internal error's stack trace. */
    static final String DEBUG = "--debug";

    private Cli() {}

    /** A number option in the one decimal syntax ({@link org.arcwright.io.DecimalText}): no 1.5f, 0x1p1 or NaN. */
    private static Double decimal(String text) {
        try {
            return DecimalText.parseFinite(text);
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException(e.getMessage());
        }
    }

    /** A configured command line with every command, writing to the given streams. */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err) {
        return configured(out, err, ArcwrightCommand.SUBCOMMANDS);
    }

    /**
     * A configured command line for {@code args}: with only the command they name when their first
     * word is a command's name, so that picocli reads the options of that command alone; with every
     * command otherwise (top-level help, {@code help}, an option first, a misspelt command that needs
     * the others to suggest from). Parsing, help and errors of the named command are as with every
     * command registered.
     */
    public static CommandLine commandLine(PrintWriter out, PrintWriter err, String[] args) {
        if (args.length > 0 && !args[0].equals("help")) {
            for (Class<?> c : ArcwrightCommand.SUBCOMMANDS) {
                CommandLine.Command command = c.getAnnotation(CommandLine.Command.class);
                if (command != null && command.name().equals(args[0])) return configured(out, err, List.of(c));
            }
        }
        return commandLine(out, err);
    }

    private static CommandLine configured(PrintWriter out, PrintWriter err, List<Class<?>> commands) {
        CommandLine cl = new CommandLine(new ArcwrightCommand());
        for (Class<?> c : commands) cl.addSubcommand(c);
        cl.setOut(out);
        cl.setErr(err);
        cl.setCaseInsensitiveEnumValuesAllowed(true);
        cl.registerConverter(Double.class, Cli::decimal);
        cl.registerConverter(double.class, Cli::decimal);
        cl.setExecutionStrategy(Cli::executeKnown);
        cl.setExecutionExceptionHandler((ex, commandLine, parseResult) -> {
            Throwable t = ex;
            while (!(t instanceof InputProblem) && t.getCause() != null && t.getCause() != t) t = t.getCause();
            if (t instanceof InputProblem p) {
                commandLine.getErr().println(prefix(commandLine) + p.getMessage());
                return BAD_INPUT;
            }
            if (ex instanceof UncheckedIOException || ex instanceof IOException) {
                commandLine.getErr().println(prefix(commandLine) + ex.getMessage());
                return BAD_INPUT;
            }
            commandLine.getErr().println(prefix(commandLine) + "internal error: this is a fault in Arcwright, not in "
                    + "your input; no result was produced. Run again with " + DEBUG + " for the details to report.");
            if (parseResult != null && debugAsked(parseResult)) ex.printStackTrace(commandLine.getErr());
            return INTERNAL_ERROR;
        });
        cl.setParameterExceptionHandler((ex, args) -> {
            CommandLine c = ex.getCommandLine();
            c.getErr().println(prefix(c) + ex.getMessage());
            if (!CommandLine.UnmatchedArgumentException.printSuggestions(ex, c.getErr())) {
                c.getErr().println("Try '" + qualifiedName(c) + " --help' for usage.");
            }
            return BAD_INPUT;
        });
        return cl;
    }

    /**
     * Runs the last command given, but refuses words no command took first: picocli would otherwise
     * print the top help for {@code arcwright zone --help} and exit 0 for a command that does not exist.
     */
    private static int executeKnown(CommandLine.ParseResult parseResult) {
        CommandLine.ParseResult last = parseResult;
        while (last.hasSubcommand()) last = last.subcommand();
        if (!last.unmatched().isEmpty()) {
            throw new CommandLine.UnmatchedArgumentException(last.commandSpec().commandLine(), last.unmatched());
        }
        return new CommandLine.RunLast().execute(parseResult);
    }

    private static boolean debugAsked(CommandLine.ParseResult parseResult) {
        for (CommandLine.ParseResult r = parseResult; r != null; r = r.hasSubcommand() ? r.subcommand() : null) {
            if (r.hasMatchedOption(DEBUG)) return true;
        }
        return false;
    }

    /** {@code arcwright pack check: }, naming the command as the user typed it. */
    static String prefix(CommandLine c) {
        return qualifiedName(c) + ": ";
    }

    private static String qualifiedName(CommandLine c) {
        StringBuilder sb = new StringBuilder(c.getCommandName());
        for (CommandLine p = c.getParent(); p != null; p = p.getParent()) sb.insert(0, p.getCommandName() + " ");
        return sb.toString();
    }

    /** Runs the command line on {@code args} with the process's streams; returns the exit code. */
    public static int run(String[] args) {
        PrintWriter out = new PrintWriter(new OutputStreamWriter(System.out, StandardCharsets.UTF_8), true);
        PrintWriter err = new PrintWriter(new OutputStreamWriter(System.err, StandardCharsets.UTF_8), true);
        int code;
        try {
            code = commandLine(out, err, args).execute(args);
        } catch (OutOfMemoryError e) {
            err.println("arcwright: out of memory; no result was produced. Give Java more memory (java -Xmx...), or fewer "
                    + "points (the README states what a heap holds).");
            code = INTERNAL_ERROR;
        } catch (Error e) {
            err.println("arcwright: internal error (" + e.getClass().getSimpleName() + "); no result was produced.");
            code = INTERNAL_ERROR;
        }
        out.flush();
        err.flush();
        return code;
    }
}
