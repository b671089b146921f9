package coordination.core.curve;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.is;

import org.junit.jupiter.api.Test;

/** The fast and slow edges of relay stages under an IEC 60255-151 tolerance. */
class RelayEdgesTest {
    /** The toleranced edges invert exactly: the current found for a time gives that time back. */
    @Test
    void tolerancedEdgesInvertExactly() {
        java.util.SplittableRandom r = new java.util.SplittableRandom(11);
        for (int n = 0; n < 200; n++) {
            InverseTimeStage s = InverseTimeStage.of(InverseTimeFamily.values()[r.nextInt(7)], 100,
                    r.nextDouble(0.05, 1)).withHighCurrent(HighCurrentBehaviour.FOLLOW_EQUATION, 20);
            RelayTolerance tol = new RelayTolerance(r.nextDouble(0, 0.1), r.nextDouble(0, 0.05), 0);
            for (Edge e : Edge.values()) {
                TimeCurrentCurve edge = s.edge(e, tol);
                for (double amps : new double[] {150, 400, 1500, 9000}) {
                    double t = edge.seconds(amps);
                    if (t > 0) {
                        double back = ((Invertible) edge).currentAtSeconds(t);
                        assertThat(edge + " at " + amps, back, closeTo(amps, amps * 1e-9));
                    }
                }
            }
        }
    }


    /** An edge that computes its held time once gives the stage's own times, to the last bit. */
    @Test
    void aHeldEdgeGivesTheStagesOwnTimes() {
        java.util.SplittableRandom r = new java.util.SplittableRandom(12);
        for (int n = 0; n < 200; n++) {
            InverseTimeStage s = InverseTimeStage.of(InverseTimeFamily.values()[r.nextInt(7)], r.nextDouble(50, 500),
                    r.nextDouble(0.05, 1)).withHighCurrent(HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE,
                            r.nextDouble(5, 30));
            RelayTolerance tol = r.nextBoolean() ? RelayTolerance.NONE
                    : new RelayTolerance(r.nextDouble(0, 0.1), r.nextDouble(0, 0.05), 0);
            for (Edge e : Edge.values()) {
                TimeCurrentCurve edge = s.edge(e, tol);
                for (int k = 0; k < 50; k++) {
                    double amps = s.pickupAmps() * Math.exp(r.nextDouble(-0.5, 5));
                    double expected = tol.seconds(s.seconds(amps), e);
                    assertThat(edge + " at " + amps, Double.doubleToRawLongBits(edge.seconds(amps)),
                            is(Double.doubleToRawLongBits(expected)));
                }
                // exactly at the upper multiple the stage still follows its equation
                double at = s.pickupAmps() * s.upperMultiple();
                assertThat(edge.seconds(at), is(tol.seconds(s.seconds(at), e)));
            }
        }
    }

    /** Only the all-zero tolerance is none, as the record's equality with NONE said. */
    @Test
    void onlyTheZeroToleranceIsNone() {
        assertThat(new RelayTolerance(0, 0, 0).isNone(), is(true));
        assertThat(RelayTolerance.NONE.isNone(), is(true));
        assertThat(new RelayTolerance(0.05, 0, 0).isNone(), is(false));
        assertThat(new RelayTolerance(0, 0.03, 0).isNone(), is(false));
        assertThat(new RelayTolerance(0, 0, 1e-9).isNone(), is(false));
        assertThat(new RelayTolerance(0, 0, 0.05).isNone(), is(new RelayTolerance(0, 0, 0.05).equals(RelayTolerance.NONE)));
    }
}
