package org.arcwright.app.model;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import org.arcwright.testing.ProductionClasses;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Keeps the window's view models free of Swing, so they are tested without a screen, and the desktop
 * layered: entry point, then the window, then the panels, then the widgets and view models.
 */
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

    @Test
    void panelsAndWidgetsDoNotDependOnTheWindow() {
        noClasses().that().resideInAnyPackage("org.arcwright.app.widgets..", "org.arcwright.app.part..",
                        "org.arcwright.app.decide..", "org.arcwright.app.zoneview..", "org.arcwright.app.stress..",
                        "org.arcwright.app.check..", "org.arcwright.app.notes..", "org.arcwright.app.practice..",
                        "org.arcwright.app.model..")
                .should().dependOnClassesThat().resideInAnyPackage("org.arcwright.app.shell..")
                .check(classes);
    }

    @Test
    void widgetsDependOnNoPanel() {
        noClasses().that().resideInAPackage("org.arcwright.app.widgets..")
                .should().dependOnClassesThat().resideInAnyPackage("org.arcwright.app.part..", "org.arcwright.app.decide..",
                        "org.arcwright.app.zoneview..", "org.arcwright.app.stress..", "org.arcwright.app.check..",
                        "org.arcwright.app.notes..", "org.arcwright.app.practice..")
                .check(classes);
    }

    @Test
    void theWindowDoesNotDependOnTheEntryPoint() {
        noClasses().that().resideInAPackage("org.arcwright.app.shell..")
                .should().dependOnClassesThat().resideInAPackage("org.arcwright.app")
                .check(classes);
    }
}
