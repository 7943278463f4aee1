package org.depotcast.requests;

import org.depotcast.catalogue.Part;

/**
 * Holds one entity of its own feature and one of another's, so {@code ArchitectureTest} can show that the entity
 * rule reports the second and not the first (the rule itself reads main classes only).
 */
public final class EntityRuleSample {
    PartsRequest ownRequest;
    Part otherFeaturesPart;
}
