package org.depotcast;

import com.tngtech.archunit.core.domain.Dependency;
import com.tngtech.archunit.core.domain.JavaClass;
import com.tngtech.archunit.lang.ArchCondition;
import com.tngtech.archunit.lang.ConditionEvents;
import com.tngtech.archunit.lang.SimpleConditionEvent;
import jakarta.persistence.Entity;

import java.util.Optional;
import java.util.Set;

/**
 * A class's use of an entity (a class annotated {@code @Entity}) that belongs to another feature: field and
 * parameter types, return types, generic type arguments, calls and field accesses, each reported once per
 * dependency. A feature is the first package under {@code org.depotcast}; {@code core} and {@code common} hold no
 * entities and are not features here.
 */
final class FeatureEntityUse extends ArchCondition<JavaClass> {
    private static final String ROOT = "org.depotcast.";
    private static final Set<String> NOT_FEATURES = Set.of("core", "common");

    FeatureEntityUse() {
        super("use no entity of another feature");
    }

    /** The feature a class belongs to, empty outside {@code org.depotcast.<feature>}. */
    static Optional<String> featureOf(JavaClass javaClass) {
        String name = javaClass.getPackageName();
        if (!name.startsWith(ROOT)) {
            return Optional.empty();
        }
        String feature = name.substring(ROOT.length()).split("\\.", 2)[0];
        return NOT_FEATURES.contains(feature) ? Optional.empty() : Optional.of(feature);
    }

    @Override
    public void check(JavaClass user, ConditionEvents events) {
        Optional<String> home = featureOf(user);
        if (home.isEmpty()) {
            return;
        }
        for (Dependency dependency : user.getDirectDependenciesFromSelf()) {
            JavaClass target = dependency.getTargetClass().getBaseComponentType();
            Optional<String> owner = featureOf(target);
            if (owner.isPresent() && !owner.equals(home) && target.isAnnotatedWith(Entity.class)) {
                events.add(SimpleConditionEvent.violated(dependency, dependency.getDescription()));
            }
        }
    }
}
