package org.depotcast.access;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class UserAccountRepository implements PanacheRepository<UserAccount> {
    Optional<UserAccount> byUsername(String username) {
        return find("username", username).firstResultOptional();
    }

    List<UserAccount> allByName() {
        return listAll(Sort.by("username"));
    }

    /** Codes of the locations assigned to an account, in code order. */
    @SuppressWarnings("unchecked")
    List<String> assignedLocationCodes(long accountId) {
        return getEntityManager().createNativeQuery("""
                select l.code from user_location ul join location l on l.id = ul.location_id
                where ul.user_account_id = ?1 order by l.code""").setParameter(1, accountId).getResultList();
    }

    @SuppressWarnings("unchecked")
    Optional<String> locationCode(long locationId) {
        return getEntityManager().createNativeQuery("select code from location where id = ?1")
                .setParameter(1, locationId).getResultList().stream().findFirst();
    }
}
