package org.depotcast;

import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.domain.JavaAccess;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import com.tngtech.archunit.lang.ArchCondition;
import com.tngtech.archunit.lang.ConditionEvents;
import com.tngtech.archunit.lang.EvaluationResult;
import com.tngtech.archunit.lang.SimpleConditionEvent;
import com.tngtech.archunit.library.freeze.FreezingArchRule;
import org.depotcast.requests.EntityRuleSample;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
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

    /**
     * Other features see records, not entities. Today's uses are frozen in {@code src/test/resources/archunit_store}
     * (ArchUnit's {@code FreezingArchRule}): a use not recorded there fails, and a recorded one that is gone is
     * dropped from the store by the run, so the store only shrinks. Commit the store with the change that shrank it.
     */
    @Test
    void noFeatureUsesAnotherFeaturesEntities() {
        FreezingArchRule.freeze(classes().that().resideInAPackage("org.depotcast..").should(new FeatureEntityUse()))
                .check(MAIN);
    }

    @Test
    void theEntityRuleReportsAnotherFeaturesEntityAndNotTheOwnFeatures() {
        JavaClasses sample = new ClassFileImporter().importClasses(EntityRuleSample.class);
        EvaluationResult result = classes().should(new FeatureEntityUse()).evaluate(sample);
        assertEquals(1, result.getFailureReport().getDetails().size(), result.getFailureReport().toString());
        assertTrue(result.getFailureReport().getDetails().get(0).contains("<org.depotcast.catalogue.Part>"));
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
