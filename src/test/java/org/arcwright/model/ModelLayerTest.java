package org.arcwright.model;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.base.DescribedPredicate;
import org.junit.jupiter.api.Test;

/** Holds the central model package to what its package-info allows, so every layer can keep using it. */
class ModelLayerTest {
    @Test
    void modelImportsOnlyTheJdkJacksonIoAndTheUnitAndStyleVocabulary() {
        JavaClasses model = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.arcwright.model");
        classes().that().resideInAPackage("org.arcwright.model..")
                .should().onlyDependOnClassesThat(DescribedPredicate.describe(
                        "JDK, Jackson, io, tolerance.Units, tolerance.DrawingStyle or tolerance.CalloutParser",
                        c -> c.getPackageName().startsWith("java.")
                                || c.getPackageName().startsWith("com.fasterxml.jackson")
                                || c.getPackageName().startsWith("org.arcwright.model")
                                || c.getPackageName().startsWith("org.arcwright.io")
                                || c.getName().startsWith("org.arcwright.tolerance.Units")
                                || c.getName().startsWith("org.arcwright.tolerance.DrawingStyle")
                                // a case's tolerance is read where the case is read (tolerance imports no model)
                                || c.getName().equals("org.arcwright.tolerance.CalloutParser")
                                || c.isPrimitive() || c.isArray()))
                .check(model);
    }
}
