package org.arcwright.app.model;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;
import static org.assertj.core.api.Assertions.assertThat;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import java.lang.reflect.RecordComponent;
import java.util.ArrayList;
import java.util.List;
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

    /**
     * One concept, one type: a point of the section plane is {@code zone.Point2}, and the views draw
     * blends with {@code zone.Corner} (centre, tangent points, the blend through a point) rather
     * than their own copy of its trigonometry (the tangent distance r/tan(θ/2) was copied twice).
     */
    @Test
    void theViewsUseTheZonePackagesPointAndCornerGeometry() {
        List<String> pointCopies = new ArrayList<>();
        for (JavaClass c : classes) {
            if (!c.getPackageName().startsWith("org.arcwright.app") && !c.getPackageName().startsWith("org.arcwright.render")) continue;
            Class<?> k = c.reflect();
            if (!k.isRecord()) continue;
            RecordComponent[] rc = k.getRecordComponents();
            if (rc.length == 2 && rc[0].getType() == double.class && rc[1].getType() == double.class
                    && rc[0].getName().equals("x") && rc[1].getName().equals("y")) {
                pointCopies.add(c.getName());
            }
        }
        assertThat(pointCopies).as("records that copy org.arcwright.zone.Point2").isEmpty();
        noClasses().that().belongToAnyOf(ZonePicture.class, MeasuredPoints.class, ZoneScene.class)
                .should().callMethod(Math.class, "tan", double.class)
                .because("tangent distances and blend centres come from org.arcwright.zone.Corner")
                .check(classes);
    }

    @Test
    void theWindowDoesNotDependOnTheEntryPoint() {
        noClasses().that().resideInAPackage("org.arcwright.app.shell..")
                .should().dependOnClassesThat().resideInAPackage("org.arcwright.app")
                .check(classes);
    }
}
