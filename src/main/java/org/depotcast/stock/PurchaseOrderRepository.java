package org.depotcast.stock;

import io.quarkus.hibernate.orm.panache.PanacheRepository;
import io.quarkus.panache.common.Sort;
import jakarta.enterprise.context.ApplicationScoped;
import jakarta.persistence.LockModeType;

import java.util.List;
import java.util.Optional;

@ApplicationScoped
class PurchaseOrderRepository implements PanacheRepository<PurchaseOrder> {
    Optional<PurchaseOrder> byNumber(String orderNumber) {
        return find("orderNumber", orderNumber).firstResultOptional();
    }

    Optional<PurchaseOrder> lockedByNumber(String orderNumber) {
        return find("orderNumber", orderNumber).withLock(LockModeType.PESSIMISTIC_WRITE).firstResultOptional();
    }

    List<PurchaseOrder> withStatus(PurchaseOrderStatus status) {
        return status == null ? listAll(Sort.by("orderNumber")) : list("status", Sort.by("orderNumber"), status);
    }

    /** Outstanding quantity on open orders per (part id, destination id). */
    List<Object[]> onOrder(Long destinationId) {
        String where = destinationId == null ? "" : " and o.destination.id = :destination";
        var query = getEntityManager().createQuery("""
                select l.partId, o.destination.id, sum(l.quantityOrdered - l.quantityReceived)
                from PurchaseOrderLine l join l.purchaseOrder o
                where o.status = :open""" + where + " group by l.partId, o.destination.id", Object[].class)
                .setParameter("open", PurchaseOrderStatus.OPEN);
        if (destinationId != null) {
            query.setParameter("destination", destinationId);
        }
        return query.getResultList();
    }
}
