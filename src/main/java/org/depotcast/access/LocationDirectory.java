package org.depotcast.access;

import java.util.Collection;
import java.util.List;
import java.util.Optional;
import java.util.Set;

/**
 * What access needs to know of stock locations, answered by the stock feature, which owns the location table: access
 * keeps accounts and their assignments, and asks here for codes, kits and the central store instead of reading the
 * table itself (and without depending on stock, which depends on access for its scopes).
 */
public interface LocationDirectory {
    /** The id of the location with this code; a 422 naming {@code field} when there is none. */
    long requireId(String field, String code);

    Optional<String> codeOf(long id);

    /** The codes of these locations, in code order. */
    List<String> codesOf(Collection<Long> ids);

    /** The kits whose parent is one of these locations. */
    Set<Long> kitsUnder(Collection<Long> locationIds);

    /** The central store(s) of the programme. */
    Set<Long> centralStores();
}
