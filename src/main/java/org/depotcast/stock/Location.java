package org.depotcast.stock;

import jakarta.persistence.Cacheable;
import jakarta.persistence.Column;
import jakarta.persistence.Entity;
import jakarta.persistence.EnumType;
import jakarta.persistence.Enumerated;
import jakarta.persistence.FetchType;
import jakarta.persistence.GeneratedValue;
import jakarta.persistence.GenerationType;
import jakarta.persistence.Id;
import jakarta.persistence.JoinColumn;
import jakarta.persistence.ManyToOne;
import jakarta.persistence.Table;
import jakarta.persistence.Version;

import org.hibernate.annotations.NaturalId;
import org.hibernate.annotations.NaturalIdCache;

import java.math.BigDecimal;

@Entity
@Cacheable
@NaturalIdCache
@Table(name = "location")
public class Location {
    @Id
    @GeneratedValue(strategy = GenerationType.IDENTITY)
    public Long id;
    @NaturalId(mutable = true)
    @Column(nullable = false, unique = true)
    public String code;
    @Column(nullable = false)
    public String name;
    @Enumerated(EnumType.STRING)
    @Column(nullable = false)
    public LocationKind kind;
    @ManyToOne(fetch = FetchType.LAZY)
    @JoinColumn(name = "parent_id")
    public Location parent;
    public BigDecimal latitude;
    public BigDecimal longitude;
    @Column(name = "mechanic_username")
    public String mechanicUsername;
    @Version
    public long version;

    /** The depot this location belongs to: itself for a depot, its parent for a kit, none for the central store. */
    public Location depot() {
        return switch (kind) {
            case DEPOT -> this;
            case KIT -> parent;
            case CENTRAL_STORE, IN_TRANSIT -> null;
        };
    }
}
