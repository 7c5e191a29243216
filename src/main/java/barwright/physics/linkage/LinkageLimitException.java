package barwright.physics.linkage;

import java.util.Locale;

/** A wheel travel that the linkage cannot reach: it locks, or flips over, before it gets there. */
public final class LinkageLimitException extends RuntimeException {
    private final transient TravelLimit limit;

    LinkageLimitException(double wanted, TravelLimit limit) {
        super(String.format(Locale.ROOT, "the wheel cannot reach %.0f mm of %s: %s at %.0f mm", Math.abs(wanted) * 1e3,
                wanted > 0 ? "bump" : "droop", limit.reason(), Math.abs(limit.travel()) * 1e3));
        this.limit = limit;
    }

    /** @return the limit that stops the wheel */
    public TravelLimit limit() {
        return limit;
    }
}
