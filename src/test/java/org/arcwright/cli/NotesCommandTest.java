package org.arcwright.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** {@code arcwright notes ...} run in-process over the built-in notes, with the cache and personal pack in a temporary folder. */
class NotesCommandTest {
    @TempDir
    Path tmp;

    private record Run(int code, String out, String err) {}

    private Run run(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        String[] all = new String[args.length + 4];
        System.arraycopy(args, 0, all, 0, args.length);
        all[args.length] = "--index-cache";
        all[args.length + 1] = tmp.resolve("cache").toString();
        all[args.length + 2] = "--personal";
        all[args.length + 3] = tmp.resolve("personal").toString();
        int code = Cli.commandLine(new PrintWriter(out, true), new PrintWriter(err, true)).execute(all);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void searchPrintsJsonHitsWithIdTitleScoreSnippetAndPack() throws Exception {
        Run r = run("notes", "search", "o-ring", "groove", "corner", "--limit", "3", "--format", "json");
        assertThat(r.code()).as(r.err()).isEqualTo(Cli.OK);
        JsonNode json = new ObjectMapper().readTree(r.out());
        JsonNode hits = json.get("hits");
        assertThat(hits).hasSize(3);
        JsonNode top = hits.get(0);
        assertThat(top.get("id").asText()).isEqualTo("o-ring-groove-radii");
        assertThat(top.get("title").asText()).isNotBlank();
        assertThat(top.get("score").asDouble()).isPositive();
        assertThat(top.get("snippet").asText()).contains("**");
        assertThat(top.get("pack").asText()).isEqualTo("Arcwright built-in practice");
        assertThat(json.get("facets").get("function").get("sealing").asInt()).isPositive();
    }

    @Test
    void searchTextWithQuerySyntaxIsNotAnError() {
        for (String q : new String[] {"R0.5 (", "\"", "*", "AND", "title:(CR"}) {
            Run r = run("notes", "search", q);
            assertThat(r.code()).as("query %s: %s", q, r.err()).isEqualTo(Cli.OK);
        }
        assertThat(run("notes", "search", "*").out()).contains("No notes found");
    }

    @Test
    void searchCanBeFilteredByProcess() throws Exception {
        Run r = run("notes", "search", "fillet", "--process", "forged", "--format", "json");
        JsonNode hits = new ObjectMapper().readTree(r.out()).get("hits");
        assertThat(hits).isNotEmpty();
        for (JsonNode h : hits) assertThat(h.get("processes").toString()).contains("forged");
    }

    @Test
    void showPrintsTheNoteAndRelatedNotes() {
        Run r = run("notes", "show", "radius-vs-controlled-radius");
        assertThat(r.code()).isEqualTo(Cli.OK);
        assertThat(r.out()).startsWith("# Radius with limits or controlled radius (CR)?").contains("Related:");
    }

    @Test
    void showOfAnUnknownIdIsBadInput() {
        Run r = run("notes", "show", "no-such-note");
        assertThat(r.code()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains("no note 'no-such-note'");
    }

    @Test
    void addPutsTheNoteInThePersonalPackAndSearchFindsIt() throws Exception {
        Path file = tmp.resolve("mine.md");
        Files.writeString(file, """
                ---
                id: quillfeather-bracket-fillets
                title: Fillets on Quillfeather Instruments brackets
                tags: bracket, fillet
                functions: stress-relief
                standard: common practice
                ---
                Invented demo note: our brackets use R2 MIN at the web.
                """);
        Run add = run("notes", "add", file.toString());
        assertThat(add.code()).as(add.err()).isEqualTo(Cli.OK);
        assertThat(add.out()).contains("Added quillfeather-bracket-fillets");
        assertThat(tmp.resolve("personal/pack.json")).exists();
        assertThat(tmp.resolve("personal/notes/quillfeather-bracket-fillets.md")).exists();
        Run search = run("notes", "search", "quillfeather", "--format", "json");
        assertThat(new ObjectMapper().readTree(search.out()).get("hits").get(0).get("pack").asText()).isEqualTo("Personal notes");
    }

    @Test
    void addingANoteWithABrokenHeaderIsBadInputNamingFileAndLine() throws Exception {
        Path file = tmp.resolve("broken.md");
        Files.writeString(file, "---\nid: x\ntitel: typo\n---\nbody\n");
        Run r = run("notes", "add", file.toString());
        assertThat(r.code()).isEqualTo(Cli.BAD_INPUT);
        assertThat(r.err()).contains(file + ":3:1: titel: unknown header key");
        assertThat(tmp.resolve("personal/notes")).doesNotExist();
    }

    @Test
    void reindexReportsTheRebuild() {
        Run r = run("notes", "reindex");
        assertThat(r.code()).isEqualTo(Cli.OK);
        assertThat(r.out()).startsWith("index rebuilt:");
    }
}
