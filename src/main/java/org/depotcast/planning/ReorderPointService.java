package org.depotcast.planning;

import jakarta.enterprise.context.ApplicationScoped;
import org.depotcast.common.FieldError;
import org.depotcast.common.InvalidInputException;
import org.depotcast.core.policy.DemandDistribution;
import org.depotcast.core.policy.NegativeBinomialDemand;
import org.depotcast.core.policy.NormalDemand;
import org.depotcast.core.policy.PoissonDemand;
import org.depotcast.core.policy.ReorderPoint;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * Stateless reorder-point arithmetic for a planner's own numbers: the request's distribution and target read into
 * the core's types (400 naming each field that does not fit), then {@link ReorderPoint}.
 */
@ApplicationScoped
class ReorderPointService {
    PlanningRequests.ReorderPointResponse reorderPoint(PlanningRequests.ReorderPointRequest r) {
        List<FieldError> errors = new ArrayList<>();
        if (!(r.serviceLevel() > 0 && r.serviceLevel() < 1)) {
            errors.add(new FieldError("serviceLevel", "must be in (0, 1), was " + r.serviceLevel()));
        }
        String kind = r.distribution() == null ? "poisson" : r.distribution().toLowerCase(Locale.ROOT);
        double mean = r.leadTimeDemandMean();
        DemandDistribution demand = null;
        switch (kind) {
            case "poisson" -> demand = new PoissonDemand(mean);
            case "negative-binomial" -> {
                if (r.variance() == null || !(r.variance() > mean) || !(mean > 0)) {
                    errors.add(new FieldError("variance", "a negative binomial needs a mean > 0 and a variance above it"));
                } else {
                    demand = new NegativeBinomialDemand(mean, r.variance());
                }
            }
            case "normal" -> {
                if (r.variance() == null || !(r.variance() > 0)) {
                    errors.add(new FieldError("variance", "a normal distribution needs a variance > 0"));
                } else {
                    demand = new NormalDemand(mean, r.variance());
                }
            }
            default -> errors.add(new FieldError("distribution", "must be poisson, negative-binomial or normal, was '"
                    + r.distribution() + "'"));
        }
        ReorderPoint.Target target = ReorderPoint.Target.CYCLE_SERVICE_LEVEL;
        if ("fill-rate".equalsIgnoreCase(r.target())) {
            target = ReorderPoint.Target.FILL_RATE;
        } else if (r.target() != null && !"cycle-service-level".equalsIgnoreCase(r.target())) {
            errors.add(new FieldError("target", "must be cycle-service-level or fill-rate, was '" + r.target() + "'"));
        }
        if (!errors.isEmpty()) {
            throw new InvalidInputException(errors);
        }
        double q = r.orderQuantity() == null ? 1 : r.orderQuantity();
        ReorderPoint.Result result = ReorderPoint.of(demand, r.serviceLevel(), target, q);
        return new PlanningRequests.ReorderPointResponse(result.reorderPoint(), result.cycleServiceLevel(),
                result.fillRate(), result.expectedBackorders(), demand.name());
    }
}
