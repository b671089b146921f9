package coordination.core.curve;

import coordination.core.internal.Checks;
import java.io.InvalidObjectException;
import java.io.ObjectInputStream;
import java.io.Serial;
import java.io.Serializable;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * An overcurrent relay and its circuit breaker: several stages acting together (the fastest wins),
 * an optional current-transformer ratio, an optional breaker interrupting time and the relay's
 * stated accuracy.
 *
 * <p>With a CT ratio, stage pickups are relay settings in secondary amperes and are referred to the
 * primary by multiplying with {@code primaryAmps / secondaryAmps}. Every stage has a fast and a slow
 * edge ({@link RelayStage#edge}): the tolerance, the band above an inverse stage's effective range,
 * an assumed instantaneous operating time. The minimum curve is the fast edge of the operating
 * time; {@link #slowestOperatingCurve()} the slow edge; the maximum curve adds the breaker's
 * interrupting time to the slow edge to give the clearing time.
 */
public final class Relay implements ProtectiveDevice {
    @Serial
    private static final long serialVersionUID = 1L;

    private final String id;
    private final List<TimeCurrentCurve> stages;
    private final Optional<CurrentTransformer> ct;
    private final double ctRatio;
    private final double breakerSeconds;
    private final RelayTolerance tolerance;
    private final TimeCurrentCurve fastOperating;
    private final TimeCurrentCurve slowOperating;
    private final TimeCurrentCurve clearing;

    /**
     * Creates a relay.
     *
     * @param id identifier
     * @param stages one or more stages, settings in secondary amperes when {@code ctRatio != 1}
     * @param ctRatio CT primary amperes per secondary ampere, above 0; 1 when settings are primary
     * @param breakerSeconds breaker interrupting time in seconds, 0 or more
     * @throws IllegalArgumentException if no stage is given or a parameter is out of range
     */
    public Relay(String id, List<? extends TimeCurrentCurve> stages, double ctRatio, double breakerSeconds) {
        this(id, stages, ratioOnly(id, ctRatio), breakerSeconds);
    }

    /**
     * Creates a relay behind a current transformer, or with primary settings.
     *
     * @param id identifier
     * @param stages one or more stages, settings in secondary amperes when a CT is given
     * @param ct the current transformer, or empty when the settings are primary amperes
     * @param breakerSeconds breaker interrupting time in seconds, 0 or more
     * @throws IllegalArgumentException if the id is missing, no stage is given or a time is out of range
     */
    public Relay(String id, List<? extends TimeCurrentCurve> stages, Optional<CurrentTransformer> ct,
            double breakerSeconds) {
        this(id, stages, ct, breakerSeconds, RelayTolerance.NONE);
    }

    /**
     * Creates a relay with a stated accuracy.
     *
     * @param id identifier
     * @param stages one or more stages, settings in secondary amperes when a CT is given
     * @param ct the current transformer, or empty when the settings are primary amperes
     * @param breakerSeconds breaker interrupting time in seconds, 0 or more
     * @param tolerance the relay's accuracy, or {@link RelayTolerance#NONE} when not stated
     * @throws IllegalArgumentException if an argument is missing, no stage is given or a time is out of range
     */
    public Relay(String id, List<? extends TimeCurrentCurve> stages, Optional<CurrentTransformer> ct,
            double breakerSeconds, RelayTolerance tolerance) {
        if (id == null || stages == null || ct == null) {
            throw new IllegalArgumentException("relay: found a null id, stage list or CT - each must be given");
        }
        this.id = id;
        Checks.nonNegative("relay '" + id + "': breaker interrupting time", breakerSeconds, "s");
        this.tolerance = Checks.given("relay '" + id + "': tolerance", tolerance);
        this.stages = List.copyOf(stages);
        this.ct = ct;
        this.ctRatio = ct.map(CurrentTransformer::ratio).orElse(1.0);
        this.breakerSeconds = breakerSeconds;
        this.fastOperating = new FastestOfCurve("relay '" + id + "' fast edge", edges(Edge.FAST));
        this.slowOperating = new FastestOfCurve("relay '" + id + "'", edges(Edge.SLOW));
        this.clearing = slowOperating.delayedBy(breakerSeconds);
    }

    /** The settings alone go: the edges are built again by the constructor, which checks the settings. */
    private record SerialForm(String id, List<TimeCurrentCurve> stages, CurrentTransformer ct, double breakerSeconds,
            RelayTolerance tolerance) implements Serializable {
        @Serial
        private Object readResolve() {
            return new Relay(id, stages, Optional.ofNullable(ct), breakerSeconds, tolerance);
        }
    }

    @Serial
    private Object writeReplace() {
        return new SerialForm(id, stages, ct.orElse(null), breakerSeconds, tolerance);
    }

    @Serial
    private void readObject(ObjectInputStream in) throws InvalidObjectException {
        throw new InvalidObjectException("a relay is read through its serial form");
    }

    private List<TimeCurrentCurve> edges(Edge edge) {
        List<TimeCurrentCurve> primary = new ArrayList<>();
        for (TimeCurrentCurve s : stages) {
            TimeCurrentCurve e = s instanceof RelayStage r ? r.edge(edge, tolerance) : s;
            primary.add(e.scaledCurrent(ctRatio));
        }
        return primary;
    }

    private static Optional<CurrentTransformer> ratioOnly(String id, double ctRatio) {
        Checks.positive("relay '" + id + "': CT ratio", ctRatio, "");
        return ctRatio == 1.0 ? Optional.empty() : Optional.of(new CurrentTransformer(ctRatio, 1.0));
    }

    /**
     * A relay with primary settings and no breaker time.
     *
     * @param id identifier
     * @param stages one or more stages in primary amperes
     * @return the relay
     */
    public static Relay of(String id, TimeCurrentCurve... stages) {
        return new Relay(id, List.of(stages), 1.0, 0.0);
    }

    /**
     * This relay with another breaker interrupting time.
     *
     * @param seconds interrupting time in seconds, 0 or more
     * @return the new relay
     */
    public Relay withBreakerSeconds(double seconds) {
        return new Relay(id, stages, ct, seconds, tolerance);
    }

    /**
     * This relay with other stages.
     *
     * @param newStages one or more stages
     * @return the new relay
     */
    public Relay withStages(List<? extends TimeCurrentCurve> newStages) {
        return new Relay(id, newStages, ct, breakerSeconds, tolerance);
    }

    @Override
    public String id() {
        return id;
    }

    @Override
    public DeviceKind kind() {
        return DeviceKind.RELAY;
    }

    /** @return the stages as set, in secondary amperes when a CT ratio is given */
    public List<TimeCurrentCurve> stages() {
        return stages;
    }

    /** @return the current transformer, or empty when the settings are primary amperes */
    public Optional<CurrentTransformer> currentTransformer() {
        return ct;
    }

    /** @return CT primary amperes per secondary ampere, 1 without a CT */
    public double ctRatio() {
        return ctRatio;
    }

    /** @return breaker interrupting time in seconds */
    public double breakerSeconds() {
        return breakerSeconds;
    }

    /** @return the relay's stated accuracy, {@link RelayTolerance#NONE} when not stated */
    public RelayTolerance tolerance() {
        return tolerance;
    }

    /**
     * This relay with a stated accuracy.
     *
     * @param newTolerance the accuracy
     * @return the new relay
     */
    public Relay withTolerance(RelayTolerance newTolerance) {
        return new Relay(id, stages, ct, breakerSeconds, newTolerance);
    }

    @Override
    public TimeCurrentCurve minimumCurve() {
        return fastOperating;
    }

    /** @return the slow edge of the operating time, without the breaker's interrupting time */
    @Override
    public TimeCurrentCurve slowestOperatingCurve() {
        return slowOperating;
    }

    @Override
    public TimeCurrentCurve maximumCurve() {
        return clearing;
    }

    @Override
    public String toString() {
        return "relay '" + id + "'";
    }
}
