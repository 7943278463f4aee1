package org.depotcast.access;

import jakarta.enterprise.context.ApplicationScoped;
import jakarta.enterprise.event.Event;
import jakarta.transaction.Transactional;
import org.depotcast.common.ConflictException;
import org.depotcast.common.InvalidInputException;

import java.util.List;
import java.util.Optional;
import java.util.Set;

/** Accounts and their roles. */
@ApplicationScoped
public class AccountService {
    /** Fired after any account change, so cached sign-ins are dropped. */
    public record AccountsChanged() {
    }

    /** Names that must never be an account, though no name carries any power. */
    private static final Set<String> RESERVED_NAMES = Set.of("system", "anonymous", "internal");
    private static final java.util.regex.Pattern NAME = java.util.regex.Pattern.compile("[a-z0-9._-]{1,60}");
    private static final Set<String> KNOWN_ROLES = Set.of(Roles.STORES_OFFICER, Roles.MECHANIC, Roles.PROGRAMME_LEAD,
            Roles.ADMIN);

    private final UserAccountRepository accounts;
    private final Event<AccountsChanged> changed;
    private final AuditService audit;
    private final CurrentUser currentUser;

    private final LocationDirectory locations;

    AccountService(UserAccountRepository accounts, Event<AccountsChanged> changed, AuditService audit, CurrentUser currentUser,
                   LocationDirectory locations) {
        this.locations = locations;
        this.currentUser = currentUser;
        this.audit = audit;
        this.accounts = accounts;
        this.changed = changed;
    }

    @Transactional
    public Optional<UserAccount> findEnabled(String username) {
        return accounts.byUsername(username).filter(a -> a.enabled);
    }

    public List<UserAccount> all() {
        return accounts.allByName();
    }

    /** The signed-in account as the pages need it: roles, assigned locations, kit. */
    public record Profile(String username, Set<String> roles, List<String> locationCodes, String kitCode) {
    }

    @Transactional
    public Profile profile(String username) {
        UserAccount account = accounts.byUsername(username)
                .orElseThrow(() -> new org.depotcast.common.EntityMissingException(null, "account", username));
        String kit = account.kitLocationId == null ? null : locations.codeOf(account.kitLocationId).orElse(null);
        return new Profile(account.username, new java.util.TreeSet<>(account.roleSet()),
                locations.codesOf(accounts.assignedLocationIds(account.id)), kit);
    }

    /** The account of that name; 404 when there is none. */
    @Transactional
    public UserAccount require(String username) {
        return accounts.byUsername(username)
                .orElseThrow(() -> new org.depotcast.common.EntityMissingException(null, "account", username));
    }

    public long count() {
        return accounts.count();
    }

    /** Replaces the locations an account acts on (a stores officer's depots, or the central store). */
    @Transactional
    public void assignLocations(String username, java.util.Collection<Long> locationIds) {
        UserAccount account = accounts.byUsername(username)
                .orElseThrow(() -> new org.depotcast.common.EntityMissingException(null, "account", username));
        var em = accounts.getEntityManager();
        em.createNativeQuery("delete from user_location where user_account_id = ?1").setParameter(1, account.id).executeUpdate();
        for (Long id : locationIds) {
            em.createNativeQuery("insert into user_location (user_account_id, location_id) values (?1, ?2)")
                    .setParameter(1, account.id).setParameter(2, id).executeUpdate();
        }
        audit.record("ACCOUNT_LOCATIONS_SET", "account", username, null, java.util.Map.of("locationIds", locationIds));
        changed.fire(new AccountsChanged());
    }

    /** As {@link #assignLocations}, naming the locations by code: an unknown code is a 422 naming {@code codes}. */
    @Transactional
    public void assignLocationCodes(String username, java.util.List<String> codes) {
        assignLocations(username, codes.stream().map(code -> locations.requireId("codes", code)).toList());
    }

    /** Adds one location to an account's assignments, keeping the others. */
    @Transactional
    public void addLocation(String username, long locationId) {
        UserAccount account = accounts.byUsername(username)
                .orElseThrow(() -> new org.depotcast.common.EntityMissingException(null, "account", username));
        accounts.getEntityManager().createNativeQuery("insert into user_location (user_account_id, location_id) values (?1, ?2)")
                .setParameter(1, account.id).setParameter(2, locationId).executeUpdate();
        changed.fire(new AccountsChanged());
    }

    /** Replaces an account's roles; an administrator cannot take the role away from their own account. */
    @Transactional
    public UserAccount setRoles(String username, Set<String> roles) {
        UserAccount account = accounts.byUsername(username)
                .orElseThrow(() -> new org.depotcast.common.EntityMissingException(null, "account", username));
        requireKnown(roles);
        if (username.equals(currentUser.name()) && account.roleSet().contains(Roles.ADMIN) && !roles.contains(Roles.ADMIN)) {
            throw new org.depotcast.common.BusinessRuleException("roles", "you cannot remove the administrator role from "
                    + "your own account; another administrator can");
        }
        String before = account.roles;
        account.roles = String.join(",", roles.stream().sorted().toList());
        audit.record("ACCOUNT_ROLES_SET", "account", username, java.util.Map.of("roles", before),
                java.util.Map.of("roles", account.roles));
        changed.fire(new AccountsChanged());
        return account;
    }

    private static void requireKnown(Set<String> roles) {
        if (roles == null || roles.isEmpty()) {
            throw new InvalidInputException("roles", "name at least one role");
        }
        for (String role : roles) {
            if (!KNOWN_ROLES.contains(role)) {
                throw new InvalidInputException("roles", "unknown role '" + role + "'");
            }
        }
    }

    @Transactional
    public UserAccount create(String username, String password, Set<String> roles, Long kitLocationId) {
        return create(username, password, roles, kitLocationId, java.util.List.of());
    }

    /** A new account as an administrator names it: its kit and the locations it acts on by code. */
    public record NewAccount(String username, String password, Set<String> roles, String kitCode,
                             java.util.List<String> locationCodes) {
    }

    /**
     * Creates an account from codes, in one transaction: an unknown kit or location code is a 422 naming its field
     * ({@code kitCode}, {@code locationCodes}) and leaves no account behind.
     */
    @Transactional
    public UserAccount create(NewAccount account) {
        Long kitId = account.kitCode() == null || account.kitCode().isBlank() ? null
                : locations.requireId("kitCode", account.kitCode());
        java.util.List<Long> locationIds = account.locationCodes() == null ? java.util.List.of()
                : account.locationCodes().stream().map(code -> locations.requireId("locationCodes", code)).toList();
        return create(account.username(), account.password(), account.roles(), kitId, locationIds);
    }

    /** Creates an account with the locations it acts on, in one transaction: a refusal leaves nothing behind. */
    @Transactional
    public UserAccount create(String username, String password, Set<String> roles, Long kitLocationId,
                              java.util.Collection<Long> locationIds) {
        if (username == null || !NAME.matcher(username).matches()) {
            throw new InvalidInputException("username", "may hold 1 to 60 lower-case letters, digits and . _ - only");
        }
        if (RESERVED_NAMES.contains(username)) {
            throw new InvalidInputException("username", "'" + username + "' is reserved");
        }
        if (accounts.byUsername(username).isPresent()) {
            throw new ConflictException("username", "account '" + username + "' already exists");
        }
        if (password == null || password.length() < 8) {
            throw new InvalidInputException("password", "must be at least 8 characters");
        }
        requireKnown(roles);
        UserAccount account = new UserAccount();
        account.username = username;
        account.passwordHash = PasswordHasher.hash(password);
        account.roles = String.join(",", roles.stream().sorted().toList());
        account.kitLocationId = kitLocationId;
        accounts.persist(account);
        audit.record("ACCOUNT_CREATED", "account", username, null,
                java.util.Map.of("username", username, "roles", account.roles, "kitLocationId", String.valueOf(kitLocationId)));
        if (!locationIds.isEmpty()) {
            assignLocations(username, locationIds);
        }
        changed.fire(new AccountsChanged());
        return account;
    }
}
