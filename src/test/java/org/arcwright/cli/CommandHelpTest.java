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

    private static void collect(CommandLine c, List<CommandLine> into) {
        into.add(c);
        for (CommandLine sub : c.getSubcommands().values()) {
            if (!into.contains(sub)) collect(sub, into);
        }
    }
}
