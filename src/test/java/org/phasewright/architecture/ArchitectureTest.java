package org.phasewright.architecture;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.library.dependencies.SlicesRuleDefinition;
import org.junit.jupiter.api.Test;

/**
 * The layering the contributor guide describes: the computation core knows nothing of files,
 * terminals, windows or serialization formats, and its packages do not depend on each other in
 * cycles.
 */
class ArchitectureTest {

    private static final String[] CORE = {
        "org.phasewright.series..", "org.phasewright.model..", "org.phasewright.fit..", "org.phasewright.stats..",
        "org.phasewright.spectrum..", "org.phasewright.diagnostics..", "org.phasewright.refine..",
        "org.phasewright.uncertainty..", "org.phasewright.selection..", "org.phasewright.analysis.."
    };

    private final JavaClasses classes = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.phasewright");

    @Test
    void coreHasNoFrontEndOrFileCode() {
        noClasses().that().resideInAnyPackage(CORE)
                .should().dependOnClassesThat().resideInAnyPackage(
                        "org.phasewright.io..", "org.phasewright.cli..", "org.phasewright.ui..", "org.phasewright.demo..",
                        "javafx..", "picocli..", "com.fasterxml.jackson..", "org.apache.commons.csv..",
                        "me.tongfei..", "javax.sound..", "java.nio.file..")
                .allowEmptyShould(true)
                .check(classes);
    }

    /** Commons Math is on the runtime class path only because JTransforms needs it; we use it as a test reference. */
    @Test
    void mainCodeDoesNotUseTheReferenceLibrary() {
        noClasses().that().resideInAPackage("org.phasewright..")
                .should().dependOnClassesThat().resideInAPackage("org.apache.commons.math3..")
                .check(classes);
    }

    @Test
    void corePrintsNothing() {
        noClasses().that().resideInAnyPackage(CORE)
                .should().accessField(System.class, "out")
                .orShould().accessField(System.class, "err")
                .allowEmptyShould(true)
                .check(classes);
    }

    @Test
    void corePackagesHaveNoCycles() {
        SlicesRuleDefinition.slices().matching("org.phasewright.(*)..").should().beFreeOfCycles()
                .allowEmptyShould(true)
                .check(classes);
    }
}
