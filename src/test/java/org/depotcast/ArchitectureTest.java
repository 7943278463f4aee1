package org.depotcast;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.JavaAccess;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchCondition;
import com.tngtech.archunit.lang.ConditionEvents;
import com.tngtech.archunit.lang.SimpleConditionEvent;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static com.tngtech.archunit.library.dependencies.SlicesRuleDefinition.slices;

/**
 * The shape of the code between features (the core's own rule is {@code core.CoreIsFrameworkFreeTest}): features
 * (org.depotcast.&lt;feature&gt;) depend on each other without cycles, a feature's repositories are its own, and the
 * shared {@code common} package knows no feature.
 */
class ArchitectureTest {
    private static final JavaClasses MAIN = new ClassFileImporter()
            .withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS).importPackages("org.depotcast");

    @Test
    void featuresDependOnEachOtherWithoutCycles() {
        slices().matching("org.depotcast.(*)..").should().beFreeOfCycles().check(MAIN);
    }

    @Test
    void aRepositoryIsUsedOnlyInsideItsOwnFeature() {
        classes().that().haveSimpleNameEndingWith("Repository").and().resideInAPackage("org.depotcast..")
                .should(new ArchCondition<JavaClass>("be accessed only from their own feature's package") {
                    @Override
                    public void check(JavaClass repository, ConditionEvents events) {
                        for (JavaAccess<?> access : repository.getAccessesToSelf()) {
                            String from = access.getOriginOwner().getPackageName();
                            if (!from.equals(repository.getPackageName())) {
                                events.add(SimpleConditionEvent.violated(access, access.getDescription()));
                            }
                        }
                    }
                }).check(MAIN);
    }

    @Test
    void commonKnowsNoFeature() {
        classes().that().resideInAPackage("org.depotcast.common..").should().onlyDependOnClassesThat()
                .resideOutsideOfPackages("org.depotcast.access..", "org.depotcast.catalogue..", "org.depotcast.demo..",
                        "org.depotcast.fleet..", "org.depotcast.forecasting..", "org.depotcast.jobs..",
                        "org.depotcast.planning..", "org.depotcast.repairs..", "org.depotcast.requests..",
                        "org.depotcast.sensors..", "org.depotcast.spend..", "org.depotcast.stock..")
                .check(MAIN);
    }
}
