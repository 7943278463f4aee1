package org.depotcast.access;

import io.quarkus.security.ForbiddenException;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.EntityManager;
import jakarta.transaction.Transactional;

import java.util.HashSet;
import java.util.List;
import java.util.Set;

/**
 * Which stock locations the signed-in account may see and act on. Programme leads and admins: all. Stores
 * officers: the locations assigned to them (user_location) and the kits of their depots. Mechanics: their own kit.
 * With no one signed in: nothing (the scope fails closed). Work done by the system itself (start-up loading,
 * scheduled and background runs) runs inside {@link SystemWork} and sees everything; no request can obtain that.
 * Account names carry no power. A scope is remembered per account for {@link #REMEMBER_MILLIS} (every movement
 * asks), and forgotten at once when any account or location assignment changes.
 */
@ApplicationScoped
public class AccessScope {
    private static final long REMEMBER_MILLIS = 30_000;
    private static final Scope EVERYTHING = new Scope(null, true, null);
    private static final Scope NOTHING = new Scope(Set.of(), false, null);

    private final CurrentUser currentUser;
    private final EntityManager em;
    private final LocationDirectory locations;
    private final java.util.Map<String, Remembered> remembered = new java.util.concurrent.ConcurrentHashMap<>();

    private record Remembered(Scope scope, long until) {
    }

    /** Called on any account change (see SignInCacheReset). */
    void forgetAll() {
        remembered.clear();
    }

    AccessScope(CurrentUser currentUser, EntityManager em, LocationDirectory locations) {
        this.currentUser = currentUser;
        this.em = em;
        this.locations = locations;
    }

    /** @param locationIds null when every location is in scope */
    public record Scope(Set<Long> locationIds, boolean programme, String mechanic) {
        public boolean everything() {
            return locationIds == null;
        }

        public boolean sees(Long locationId) {
            return locationIds == null || (locationId != null && locationIds.contains(locationId));
        }
    }

    @Transactional
    public Scope current() {
        if (currentUser.isSystem()) {
            return EVERYTHING;
        }
        if (!currentUser.isSignedIn()) {
            return NOTHING;
        }
        if (currentUser.hasRole(Roles.ADMIN) || currentUser.hasRole(Roles.PROGRAMME_LEAD)) {
            return EVERYTHING;
        }
        String name = currentUser.name();
        Remembered known = remembered.get(name);
        if (known != null && known.until() > System.currentTimeMillis()) {
            return known.scope();
        }
        Scope scope = resolve(name);
        remembered.put(name, new Remembered(scope, System.currentTimeMillis() + REMEMBER_MILLIS));
        return scope;
    }

    private Scope resolve(String name) {
        Set<Long> ids = new HashSet<>();
        if (currentUser.hasRole(Roles.STORES_OFFICER)) {
            ids.addAll(longs(em.createNativeQuery("""
                    select ul.location_id from user_location ul join user_account ua on ua.id = ul.user_account_id
                    where ua.username = ?1""").setParameter(1, name).getResultList()));
            ids.addAll(locations.kitsUnder(Set.copyOf(ids)));
        }
        String mechanic = null;
        if (currentUser.hasRole(Roles.MECHANIC)) {
            mechanic = name;
            ids.addAll(longs(em.createNativeQuery("select kit_location_id from user_account where username = ?1 and kit_location_id is not null")
                    .setParameter(1, name).getResultList()));
        }
        boolean programme = locations.centralStores().stream().anyMatch(ids::contains);
        return new Scope(ids, programme, mechanic);
    }

    /** 403 unless the location is in scope. */
    public void require(Long locationId, String code) {
        if (!current().sees(locationId)) {
            throw new ForbiddenException("location '" + code + "' is outside the locations assigned to you");
        }
    }

    /** 403 unless the account sees the programme as a whole (leads, admins, officers of the central store). */
    public void requireProgramme() {
        if (!current().programme()) {
            throw new ForbiddenException("programme-wide figures are for the programme lead and the central store");
        }
    }

    /**
     * 403 unless the account keeps the programme's catalogue (parts, substitutes, pump models): officers of the
     * central store and admins (roles keep the lead and mechanics to reading it). Depot officers read it.
     */
    public void requireCatalogue() {
        if (!current().programme()) {
            throw new ForbiddenException("the catalogue (parts, substitutes, pump models) is kept by the central store");
        }
    }

    private static Set<Long> longs(List<?> values) {
        Set<Long> out = new HashSet<>();
        for (Object v : values) {
            out.add(((Number) v).longValue());
        }
        return out;
    }
}
