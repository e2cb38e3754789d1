package org.arcwright.cli;

import java.util.List;

import picocli.CommandLine.Command;

/** The root command: lists the jobs. With no arguments on a desktop, the launcher opens the window instead. */
@Command(name = "arcwright",
        mixinStandardHelpOptions = true,
        versionProvider = VersionProvider.class,
        description = {
                "Tolerancing assistant for fillets, rounds and edge radii.",
                "Run with no arguments on a desktop to open the window."},
        footer = {"", "Exit codes: 0 done or pass, 1 fail, 2 bad input or usage, 3 inspect only: indeterminate (the measurement proves neither pass nor fail), 70 internal error (a fault in Arcwright).",
                "Design guidance only: defer to the governing standard, your company's practice and licensed engineering judgement."})
public final class ArcwrightCommand implements Runnable {
    /**
     * The commands, in the order the help lists them. Registered by {@link Cli}, all of them or only
     * the one a command line names: picocli reads every option of every command it is given, which
     * cost a simulation run a tenth of its start-up for commands it never ran.
     */
    static final List<Class<?>> SUBCOMMANDS = List.of(
            LimitsCommand.class,
            GeneralToleranceCommand.class,
            FilletStressCommand.class,
            ClearanceCommand.class,
            AdviseCommand.class,
            PackCommand.class,
            NotesCommand.class,
            InspectCommand.class,
            SimulateCommand.class,
            NoteCommand.class,
            RenderCommand.class,
            SheetCommand.class,
            picocli.CommandLine.HelpCommand.class);

    @picocli.CommandLine.Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @picocli.CommandLine.Option(names = Cli.DEBUG, scope = picocli.CommandLine.ScopeType.INHERIT,
            description = "On an internal error, also print the stack trace to report.")
    boolean debug;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }
}
