package org.arcwright.app.model;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import org.arcwright.testing.ProductionClasses;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/** Keeps the window's view models free of Swing, so they are tested without a screen. */
@Tag("slow")
class AppArchitectureTest {
    private final JavaClasses classes = ProductionClasses.get();

    @Test
    void viewModelsDoNotUseSwingOrAwt() {
        noClasses().that().resideInAPackage("org.arcwright.app.model..")
                .should().dependOnClassesThat().resideInAnyPackage("javax.swing..", "java.awt..", "com.formdev..",
                        "net.miginfocom..")
                .check(classes);
    }

    @Test
    void viewModelsDoNotDependOnViews() {
        noClasses().that().resideInAPackage("org.arcwright.app.model..")
                .should().dependOnClassesThat().resideInAnyPackage("org.arcwright.app.shell..", "org.arcwright.app.part..",
                        "org.arcwright.app.decide..", "org.arcwright.app.zoneview..")
                .check(classes);
    }
}
