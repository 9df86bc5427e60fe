package org.sightwork.geo;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/** The shell's own dependency rules (DESIGN.md): data and earth packages without JavaFX; no celestial code. */
class ArchitectureTest {

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.sightwork.geo");

    @Test
    void dataPackagesNeverImportJavaFx() {
        noClasses().that().resideInAnyPackage("org.sightwork.geo.earth..", "org.sightwork.geo.chart..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..").check(MAIN);
    }

    @Test
    void theShellKnowsNothingOfCelestialNavigation() {
        noClasses().should().dependOnClassesThat().resideInAPackage("org.sightwork.celestial..").check(MAIN);
    }

    @Test
    void thePluginContractDoesNotReachIntoTheShell() {
        noClasses().that().resideInAPackage("org.sightwork.geo.spi..")
                .should().dependOnClassesThat().resideInAnyPackage("org.sightwork.geo.app..",
                        "org.sightwork.geo.render..", "org.sightwork.geo.chart..").check(MAIN);
    }
}
