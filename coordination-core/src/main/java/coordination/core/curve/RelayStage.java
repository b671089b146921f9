package coordination.core.curve;

/**
 * A stage of a relay: a curve that knows its fast and slow edges, for a relay tolerance. A relay
 * builds its fastest operating curve from every stage's fast edge and its slowest from every
 * stage's slow edge.
 */
public interface RelayStage extends TimeCurrentCurve {

    /**
     * One edge of this stage.
     *
     * @param edge which edge
     * @param tolerance the relay's stated accuracy, or {@link RelayTolerance#NONE}
     * @return the curve on that edge, with the same current axis as this stage
     */
    TimeCurrentCurve edge(Edge edge, RelayTolerance tolerance);
}
