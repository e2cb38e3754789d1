package org.arcwright;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.library.GeneralCodingRules;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

/** Keeps the core free of user-interface code and of printing, so it can serve both shells. */
class ArchitectureTest {
    private static final String[] CORE = {
            "org.arcwright.io..", "org.arcwright.tolerance..", "org.arcwright.pack..", "org.arcwright.zone..",
            "org.arcwright.inspect..", "org.arcwright.mechanics..", "org.arcwright.rules..",
            "org.arcwright.notes..", "org.arcwright.templates..", "org.arcwright.callout..",
            "org.arcwright.worksheet.."};

    private static JavaClasses classes;

    @BeforeAll
    static void importClasses() {
        classes = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.arcwright");
    }

    @Test
    void corePackagesDoNotUseSwingOrAwt() {
        noClasses().that().resideInAnyPackage(CORE)
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "java.awt..")
                .check(classes);
    }

    @Test
    void corePackagesDoNotPrint() {
        noClasses().that().resideInAnyPackage(CORE)
                .should(GeneralCodingRules.ACCESS_STANDARD_STREAMS)
                .check(classes);
    }

    @Test
    void renderingOpensNoWindow() {
        noClasses().that().resideInAPackage("org.arcwright.render..")
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "org.arcwright.app..")
                .allowEmptyShould(true)
                .check(classes);
    }

    @Test
    void coreDoesNotDependOnTheShells() {
        noClasses().that().resideInAnyPackage(CORE)
                .should().dependOnClassesThat().resideInAnyPackage("org.arcwright.cli..", "org.arcwright.app..",
                        "org.arcwright.render..", "picocli..")
                .check(classes);
    }

    @Test
    void theSharedServicesAreSwingFreeAndBelowTheShells() {
        noClasses().that().resideInAPackage("org.arcwright.services..")
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "org.arcwright.cli..",
                        "org.arcwright.app..", "picocli..")
                .check(classes);
    }
}
