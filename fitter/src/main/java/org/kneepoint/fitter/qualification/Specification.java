package org.kneepoint.fitter.qualification;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * A grade's specification at one temperature: at least one {@link Limit}, at most one per
 * quantity, kept in the order of {@link SpecifiedQuantity}.
 *
 * @param temperatureK the temperature the limits hold at, K
 * @param limits       the limits, one per quantity named
 */
public record Specification(double temperatureK, List<Limit> limits) {

    public Specification {
        if (!(temperatureK > 0 && Double.isFinite(temperatureK))) {
            throw new IllegalArgumentException("a specification's temperature must be above 0 K, got " + temperatureK + " K");
        }
        if (limits == null || limits.isEmpty()) {
            throw new IllegalArgumentException("a specification needs at least one limit");
        }
        Map<SpecifiedQuantity, Limit> byQuantity = new EnumMap<>(SpecifiedQuantity.class);
        for (Limit limit : limits) {
            if (byQuantity.put(limit.quantity(), limit) != null) {
                throw new IllegalArgumentException("a specification names " + limit.quantity().key() + " twice");
            }
        }
        limits = List.copyOf(byQuantity.values());
    }

    public Optional<Limit> limit(SpecifiedQuantity quantity) {
        return limits.stream().filter(limit -> limit.quantity() == quantity).findFirst();
    }

    /** This specification with the other's limits replacing or adding to its own (the temperature stays). */
    public Specification mergedWith(Specification other) {
        List<Limit> merged = new ArrayList<>();
        for (SpecifiedQuantity quantity : SpecifiedQuantity.values()) {
            Optional<Limit> mine = limit(quantity);
            Optional<Limit> theirs = other.limit(quantity);
            if (mine.isPresent() && theirs.isPresent()) {
                merged.add(mine.get().overriddenBy(theirs.get()));
            } else {
                mine.or(() -> theirs).ifPresent(merged::add);
            }
        }
        merged.sort(Comparator.comparing(Limit::quantity));
        return new Specification(temperatureK, merged);
    }
}
