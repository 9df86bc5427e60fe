package org.sightwork.celestial;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.noClasses;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

/** The dependency rules of DESIGN.md, enforced. */
class ArchitectureTest {

    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
            .importPackages("org.sightwork");

    @Test
    void computingPackagesNeverImportJavaFx() {
        noClasses().that().resideInAnyPackage(
                        "org.sightwork.celestial.time..", "org.sightwork.celestial.almanac..",
                        "org.sightwork.celestial.sight..", "org.sightwork.celestial.reduction..",
                        "org.sightwork.celestial.fix..", "org.sightwork.celestial.passage..",
                        "org.sightwork.celestial.drill..", "org.sightwork.celestial.planning..",
                        "org.sightwork.geo.earth..", "org.sightwork.geo.track..")
                .should().dependOnClassesThat().resideInAnyPackage("javafx..")
                .allowEmptyShould(true)
                .check(MAIN);
    }

    @Test
    void theShellNeverImportsTheCelestialPlugin() {
        noClasses().that().resideInAPackage("org.sightwork.geo..")
                .should().dependOnClassesThat().resideInAPackage("org.sightwork.celestial..")
                .check(MAIN);
    }
}
