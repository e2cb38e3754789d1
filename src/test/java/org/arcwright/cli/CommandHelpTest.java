package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/**
 * Every command's help renders as written. picocli reads descriptions as format strings, so a bare
 * percent sign ("95 % intervals") is a broken conversion: picocli then warns on the console and
 * prints the raw text, {@code %n} included.
 */
class CommandHelpTest {
    @Test
    void everyCommandsHelpRendersWithoutAFormatWarning() {
        StringWriter out = new StringWriter();
        CommandLine root = Cli.commandLine(new PrintWriter(out, true), new PrintWriter(out, true));
        List<CommandLine> all = new ArrayList<>();
        collect(root, all);
        PrintStream before = System.err;
        ByteArrayOutputStream console = new ByteArrayOutputStream();
        List<String> broken = new ArrayList<>();
        try {
            System.setErr(new PrintStream(console, true, StandardCharsets.UTF_8));
            for (CommandLine c : all) {
                String usage = c.getUsageMessage(CommandLine.Help.Ansi.OFF);
                if (usage.contains("%n") || console.size() > 0) broken.add(c.getCommandSpec().qualifiedName());
                console.reset();
            }
        } finally {
            System.setErr(before);
        }
        assertThat(all).hasSizeGreaterThan(10);
        assertThat(broken).as("commands whose help does not render").isEmpty();
    }

    @Test
    void aCommandLineBuiltForOneCommandHelpsAndRefusesAsTheWholeOneDoes() {
        StringWriter sink = new StringWriter();
        CommandLine whole = Cli.commandLine(new PrintWriter(sink, true), new PrintWriter(sink, true));
        for (String name : whole.getSubcommands().keySet()) {
            if (name.equals("help")) continue;
            String[] args = {name, "--help"};
            CommandLine lean = Cli.commandLine(new PrintWriter(sink, true), new PrintWriter(sink, true), args);
            assertThat(lean.getSubcommands().keySet()).as(name).containsExactly(name);
            assertThat(lean.getSubcommands().get(name).getUsageMessage(CommandLine.Help.Ansi.OFF)).as(name)
                    .isEqualTo(whole.getSubcommands().get(name).getUsageMessage(CommandLine.Help.Ansi.OFF));
        }
        // the same refusal, word for word, for an option the command does not have
        assertThat(CliRun.of("simulate", "--partz", "3").err())
                .isEqualTo(wholeRun("simulate", "--partz", "3")).contains("arcwright simulate: Unknown option: '--partz'");
        // a misspelt command, top-level help and `help NAME` get every command
        assertThat(CliRun.of("simulte", "x.json").err()).contains("Did you mean", "simulate");
        assertThat(CliRun.of("--help").out()).contains("simulate", "inspect", "advise");
        assertThat(CliRun.of("help", "simulate").out()).startsWith("Usage: arcwright simulate");
    }

    private static String wholeRun(String... args) {
        StringWriter err = new StringWriter();
        Cli.commandLine(new PrintWriter(new StringWriter(), true), new PrintWriter(err, true)).execute(args);
        return err.toString();
    }

    private static void collect(CommandLine c, List<CommandLine> into) {
        into.add(c);
        for (CommandLine sub : c.getSubcommands().values()) {
            if (!into.contains(sub)) collect(sub, into);
        }
    }
}
