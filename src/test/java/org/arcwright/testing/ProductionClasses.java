package org.arcwright.testing;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;

/**
 * The production classes of {@code org.arcwright}, imported once per test JVM and shared by every
 * architecture test: the import, not the rules, is what takes the time.
 *
 * <p>Classes outside {@code org.arcwright} (the JDK, the libraries) are not imported beyond their
 * names ({@code src/test/resources/archunit.properties}): the rules look at package names only.
 */
public final class ProductionClasses {
    private ProductionClasses() {}

    /** The imported classes; the first call imports them, later calls return the same value. */
    public static JavaClasses get() {
        return Holder.CLASSES;
    }

    /** Initialised on first use by the JVM's class initialisation, once, and immutable after that. */
    private static final class Holder {
        static final JavaClasses CLASSES = new ClassFileImporter()
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_JARS)
                .importPackages("org.arcwright");
    }
}
