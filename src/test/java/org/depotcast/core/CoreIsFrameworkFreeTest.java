package org.depotcast.core;

import com.tngtech.archunit.core.domain.JavaClasses;
import com.tngtech.archunit.core.importer.ClassFileImporter;
import com.tngtech.archunit.core.importer.ImportOption;
import org.junit.jupiter.api.Test;

import static com.tngtech.archunit.lang.syntax.ArchRuleDefinition.classes;

/** The numerical core knows only the JDK and Commons Math, so it can be tested and reused alone. */
class CoreIsFrameworkFreeTest {
    @Test
    void coreDependsOnlyOnTheJdkAndCommonsMath() {
        JavaClasses core = new ClassFileImporter().withImportOption(ImportOption.Predefined.DO_NOT_INCLUDE_TESTS)
                .importPackages("org.depotcast.core");
        classes().should().onlyDependOnClassesThat()
                .resideInAnyPackage("java..", "org.apache.commons.math3..", "org.depotcast.core..")
                .check(core);
    }
}
