package coordination.core.network;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.is;

import java.util.List;
import org.apache.commons.math3.complex.Complex;
import org.junit.jupiter.api.Test;

/** Short-circuit currents of a radial network against IEC 60909-0's formulas, computed here directly. */
class FaultLevelsTest {
    private static final double RELATIVE = 1e-9;

    private static Network plant(double lengthM) {
        return new Network(List.of(Bus.of("HV", 11), Bus.of("MSB", 0.4), Bus.of("PH1", 0.4)),
                List.of(new Source("GRID", "HV", 250, 150, 10)),
                List.of(new Transformer("TX1", "HV", "MSB", 1000, 6, 10.5, "Dyn11")),
                List.of(new CableBranch("P1", "MSB", "PH1", lengthM, 0.193, 0.08, 250, 1)));
    }

    @Test
    void voltageFactorsFollowTable1() {
        // IEC 60909-0:2016, Table 1: up to 1 kV (+6 % tolerance) 1.05 / 0.95, above 1 kV 1.10 / 1.00
        assertThat(Bus.of("a", 0.4).cMax(), is(1.05));
        assertThat(Bus.of("a", 0.4).cMin(), is(0.95));
        assertThat(Bus.of("a", 11).cMax(), is(1.10));
        assertThat(Bus.of("a", 11).cMin(), is(1.00));
    }

    @Test
    void sourceTransformerAndCableAddAsASeriesImpedance() {
        FaultLevels f = FaultLevels.of(plant(140));
        double refer = Math.pow(0.4 / 11, 2);
        // IEC 60909-0:2016, eq. 1: Z_Q = c U_nQ^2 / S"kQ, with X/R = 10
        double zq = 1.10 * 11 * 11 / 250;
        double xq = zq / Math.sqrt(1 + 0.01);
        Complex source = new Complex(xq / 10, xq).multiply(refer);
        // eq. 7 and 8 at 0.4 kV, and the correction of eq. 12a
        double zt = 0.06 * 0.16 / 1.0;
        double rt = 0.0105 * 0.16 / 1.0;
        double xt = Math.sqrt(zt * zt - rt * rt);
        double kt = 0.95 * 1.05 / (1 + 0.6 * xt / 0.16);
        Complex transformer = new Complex(rt, xt).multiply(kt);
        Complex cable = new Complex(0.193 * 0.140, 0.08 * 0.140);
        Complex atMsb = source.add(transformer);
        Complex atEnd = atMsb.add(cable);
        // eq. 29: I"k3 = c U_n / (sqrt 3 |Z_k|)
        assertThat(f.at("MSB").orElseThrow().ik3MaxAmps(), closeTo(1.05 * 400 / (Math.sqrt(3) * atMsb.abs()),
                1e-6));
        assertThat(f.at("P1:to").orElseThrow().ik3MaxAmps(), closeTo(1.05 * 400 / (Math.sqrt(3) * atEnd.abs()),
                1e-6));
        // the minimum: c_min, S"kQ min, no K_T, the cable at its end temperature (10.3)
        double zqMin = 1.00 * 11 * 11 / 150;
        double xqMin = zqMin / Math.sqrt(1 + 0.01);
        Complex min = new Complex(xqMin / 10, xqMin).multiply(refer).add(new Complex(rt, xt))
                .add(new Complex(0.193 * 0.140 * (1 + 0.004 * 230), 0.08 * 0.140));
        double ik3Min = 0.95 * 400 / (Math.sqrt(3) * min.abs());
        FaultLevel end = f.at("P1:to").orElseThrow();
        assertThat(end.ik3MinAmps(), closeTo(ik3Min, ik3Min * RELATIVE));
        // eq. 34, far from generator
        assertThat(end.ik2MinAmps(), closeTo(Math.sqrt(3) / 2 * ik3Min, ik3Min * RELATIVE));
        // eq. 55 and 54
        double rx = atEnd.getReal() / atEnd.getImaginary();
        assertThat(end.kappa(), closeTo(1.02 + 0.98 * Math.exp(-3 * rx), 1e-12));
        assertThat(end.ipAmps(), closeTo(end.kappa() * Math.sqrt(2) * end.ik3MaxAmps(), 1e-6));
        // the sending end of the cable is its bus
        assertThat(f.at("P1:from").orElseThrow().ik3MaxAmps(), is(f.at("MSB").orElseThrow().ik3MaxAmps()));
    }

    @Test
    void behindAStiffSourceATransformerGivesItsRatedCurrentOverUk() {
        // common practice: I"k = I_rT / u_k on an infinite source; with c and K_T, c / K_T times that
        Network n = new Network(List.of(Bus.of("HV", 11), Bus.of("LV", 0.4)),
                List.of(new Source("G", "HV", 1e9, 1e9, 10)),
                List.of(new Transformer("T", "HV", "LV", 1000, 6, 10.5, "Dyn11")), List.of());
        FaultLevels f = FaultLevels.of(n);
        double ir = 1000 / (Math.sqrt(3) * 0.4);
        double kt = FaultLevels.correction(n.transformers().get(0), 1.05);
        assertThat(f.at("LV").orElseThrow().ik3MaxAmps(), closeTo(1.05 / kt * ir / 0.06, 1e-3 * ir / 0.06 / 1000));
    }

    @Test
    void theCorrectionFactorIsEquation12a() {
        Transformer t = new Transformer("T", "HV", "LV", 1000, 6, 10.5, "Dyn11");
        double xt = Math.sqrt(0.06 * 0.06 - 0.0105 * 0.0105);
        // IEC 60909-0:2016, eq. 12a: K_T = 0.95 c_max / (1 + 0.6 x_T)
        assertThat(FaultLevels.correction(t, 1.05), closeTo(0.95 * 1.05 / (1 + 0.6 * xt), 1e-12));
        assertThat(t.deltaStar(), is(true));
        assertThat(new Transformer("T", "HV", "LV", 1000, 6, 10.5, "Yyn0").deltaStar(), is(false));
    }

    @Test
    void aLoopTwoSourcesAndUnknownBusesAreRefused() {
        Network loop = new Network(List.of(Bus.of("A", 0.4), Bus.of("B", 0.4)), List.of(new Source("G", "A", 20, 10, 5)),
                List.of(), List.of(new CableBranch("C1", "A", "B", 10, 0.2, 0.08, 160, 1),
                new CableBranch("C2", "B", "A", 10, 0.2, 0.08, 160, 1)));
        assertThat(loop.problems().get(0).message(), containsString("meshed networks are not supported yet"));
        Network two = new Network(List.of(Bus.of("A", 0.4), Bus.of("B", 0.4)),
                List.of(new Source("G1", "A", 20, 10, 5), new Source("G2", "B", 20, 10, 5)), List.of(),
                List.of(new CableBranch("C1", "A", "B", 10, 0.2, 0.08, 160, 1)));
        assertThat(two.problems().get(0).message(), containsString("feed one radial network"));
        Network unknown = new Network(List.of(Bus.of("A", 0.4)), List.of(new Source("G", "A", 20, 10, 5)), List.of(),
                List.of(new CableBranch("C1", "A", "X", 10, 0.2, 0.08, 160, 1)));
        assertThat(unknown.problems().get(0).key(), is("to"));
        assertThat(unknown.problems().get(0).message(), is("bus 'X' is not declared"));
        Network upsideDown = new Network(List.of(Bus.of("A", 0.4), Bus.of("B", 11)),
                List.of(new Source("G", "A", 20, 10, 5)), List.of(new Transformer("T", "A", "B", 1000, 6, 10, "Dyn11")),
                List.of());
        assertThat(upsideDown.problems().get(0).message(), containsString("must have the higher voltage"));
    }
}
