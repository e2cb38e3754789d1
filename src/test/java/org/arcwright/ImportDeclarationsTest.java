package org.arcwright;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import org.junit.jupiter.api.Test;

/** The reading of a package-info's "May import:" sentence that {@link ArchitectureTest} enforces. */
class ImportDeclarationsTest {
    private static final Path FILE = Path.of("x/package-info.java");

    private static ImportDeclarations.Declaration parse(String javadoc) {
        return ImportDeclarations.parse("org.arcwright.x", FILE, "/**\n * What x holds.\n *\n" + javadoc + "\n */\npackage org.arcwright.x;\n");
    }

    @Test
    void readsPackagesShortNamesAndWordsUpToTheFullStop() {
        ImportDeclarations.Declaration d = parse(" * <p>May import: the JDK, Jackson, {@code org.arcwright.io} and\n * {@code tolerance}. Must not import {@code pack}.");
        assertThat(d.allows("java.util.function")).isTrue();
        assertThat(d.allows("com.fasterxml.jackson.databind.node")).isTrue();
        assertThat(d.allows("org.arcwright.io")).isTrue();
        assertThat(d.allows("org.arcwright.tolerance")).isTrue();
        assertThat(d.allows("org.arcwright.pack")).as("after the full stop").isFalse();
        assertThat(d.allows("org.arcwright.x")).as("its own package").isTrue();
    }

    @Test
    void theJdkLeavesOutAwtSwingAndImageIoUnlessNamed() {
        ImportDeclarations.Declaration plain = parse(" * <p>May import: the JDK.");
        assertThat(plain.allows("java.awt.geom")).isFalse();
        assertThat(plain.allows("javax.swing")).isFalse();
        assertThat(plain.allows("javax.imageio")).isFalse();
        ImportDeclarations.Declaration drawing = parse(" * <p>May import: the JDK including {@code java.awt} and {@code javax.imageio}.");
        assertThat(drawing.allows("java.awt.geom")).isTrue();
        assertThat(drawing.allows("javax.imageio.stream")).isTrue();
        assertThat(drawing.allows("javax.swing")).isFalse();
    }

    @Test
    void bracketsWithPackagesStandForTheWordsBeforeThemOthersAreComments() {
        ImportDeclarations.Declaration d = parse(" * <p>May import: the core packages ({@code io}, {@code pack}), {@code java.awt} (for images)\n * and {@code app.model}.");
        assertThat(d.allows("org.arcwright.io")).isTrue();
        assertThat(d.allows("org.arcwright.pack")).isTrue();
        assertThat(d.allows("org.arcwright.rules")).as("only the listed core packages").isFalse();
        assertThat(d.allows("java.awt")).isTrue();
        assertThat(d.allows("org.arcwright.app.model")).isTrue();
        assertThat(d.allows("org.arcwright.app")).isFalse();
    }

    @Test
    void ourPackagesAreExactLibrariesIncludeTheirSubPackages() {
        ImportDeclarations.Declaration d = parse(" * <p>May import: {@code org.arcwright.render} and Lucene.");
        assertThat(d.allows("org.arcwright.render.plot")).isFalse();
        assertThat(d.allows("org.apache.lucene.search.similarities")).isTrue();
    }

    @Test
    void anUnknownWordOrAMissingSentenceIsAnErrorNamingTheFile() {
        assertThatThrownBy(() -> parse(" * <p>May import: the JDK and some helpers."))
                .hasMessageContaining("x/package-info.java").hasMessageContaining("'some helpers'");
        assertThatThrownBy(() -> parse(" * <p>Imports whatever it likes."))
                .hasMessageContaining("x/package-info.java").hasMessageContaining("May import");
    }

    @Test
    void onlyNamedTypesOfAPackageWhenTheBracketListsTypes() {
        ImportDeclarations.Declaration d = parse(" * <p>May import: the JDK, Jackson, {@code org.arcwright.io}, and from {@code org.arcwright.tolerance}\n"
                + " * only the two vocabulary types a case carries ({@code Units}, {@code DrawingStyle}); {@code tolerance}\n"
                + " * itself imports only the JDK, Jackson and {@code io}, so no cycle can form. Must not import Swing/AWT.");
        assertThat(d.allows("org.arcwright.io")).isTrue();
        assertThat(d.allows("org.arcwright.tolerance", "org.arcwright.tolerance.Units")).isTrue();
        assertThat(d.allows("org.arcwright.tolerance", "org.arcwright.tolerance.DrawingStyle$Mark")).isTrue();
        assertThat(d.allows("org.arcwright.tolerance", "org.arcwright.tolerance.CrescentZone")).isFalse();
        assertThat(d.allows("org.arcwright.tolerance")).isFalse();
    }
}
