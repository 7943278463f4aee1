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

    @SuppressWarnings("unchecked")
    List<Long> assignedLocationIds(long accountId) {
        return ((List<Number>) getEntityManager().createNativeQuery(
                        "select location_id from user_location where user_account_id = ?1")
                .setParameter(1, accountId).getResultList()).stream().map(Number::longValue).toList();
    }
}
