package org.depotcast.stock;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.transaction.Transactional;
import org.depotcast.access.LocationDirectory;
import org.depotcast.common.EntityMissingException;

import java.util.Collection;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/** The stock feature's answers to access about locations (see {@link LocationDirectory}). */
@ApplicationScoped
class StockLocationDirectory implements LocationDirectory {
    private final LocationRepository locations;

    StockLocationDirectory(LocationRepository locations) {
        this.locations = locations;
    }

    @Override
    @Transactional
    public long requireId(String field, String code) {
        return locations.byCode(code).orElseThrow(() -> new EntityMissingException(field, "location", code)).id;
    }

    @Override
    @Transactional
    public Optional<String> codeOf(long id) {
        return locations.findByIdOptional(id).map(l -> l.code);
    }

    @Override
    @Transactional
    public List<String> codesOf(Collection<Long> ids) {
        return ids.isEmpty() ? List.of()
                : locations.list("id in ?1", io.quarkus.panache.common.Sort.by("code"), ids).stream().map(l -> l.code).toList();
    }

    @Override
    @Transactional
    public Set<Long> kitsUnder(Collection<Long> locationIds) {
        Set<Long> kits = new HashSet<>();
        if (!locationIds.isEmpty()) {
            locations.list("kind = ?1 and parent.id in ?2", LocationKind.KIT, locationIds).forEach(l -> kits.add(l.id));
        }
        return kits;
    }

    @Override
    @Transactional
    public Set<Long> centralStores() {
        Set<Long> ids = new HashSet<>();
        locations.ofKind(LocationKind.CENTRAL_STORE).forEach(l -> ids.add(l.id));
        return ids;
    }
}
