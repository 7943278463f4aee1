package org.depotcast.access;

import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import java.util.Arrays;
import java.util.Set;
import java.util.stream.Collectors;

/** A person who signs in. Passwords are kept only as bcrypt hashes. */
@Entity
@Table(name = "user_account")
public class UserAccount {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @Column(nullable = false, unique = true)
    public String username;
    @Column(name = "password_hash", nullable = false)
    public String passwordHash;
    /** Comma-separated role names from {@link Roles}. */
    @Column(nullable = false)
    public String roles;
    @Column(name = "kit_location_id")
    public Long kitLocationId;
    @Column(nullable = false)
    public boolean enabled = true;
    @Version
    public long version;

    public Set<String> roleSet() {
        return Arrays.stream(roles.split(",")).map(String::strip).filter(r -> !r.isEmpty()).collect(Collectors.toSet());
    }
}
