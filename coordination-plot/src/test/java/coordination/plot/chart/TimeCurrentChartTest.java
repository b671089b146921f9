package coordination.plot.chart;

import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.hasItems;
import static org.hamcrest.Matchers.is;

import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.Insulation;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.MarginRequirement;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.knowm.xchart.XYSeries;

class TimeCurrentChartTest {
    private static final CableThermalLimit CABLE =
            CableThermalLimit.of("C", ConductorMaterial.COPPER, Insulation.XLPE, 35, 1);
    private static final Relay RELAY = new Relay("R", List.of(
            InverseTimeStage.of(InverseTimeFamily.IEC_STANDARD_INVERSE, 250, 0.2),
            DefiniteTimeStage.definiteTime(3000, 0.1)), 1, 0.05);

    private static TimeCurrentChart chart() {
        CableCheckResult r = CableCheck.check(RELAY, CABLE, 1500, 12000, MarginRequirement.seconds(0.1));
        return new TimeCurrentChart(new ChartContent("t", 0.4, List.of(RELAY), List.of(CABLE), 1500, 12000,
                List.of(r), List.of()), 600, 450);
    }

    @Test
    void axesSpanWholeDecadesFromPickupToTheFaultRange() {
        TimeCurrentChart c = chart();
        assertThat(c.currentAxis()[0], is(100.0));
        assertThat(c.currentAxis()[1], is(100_000.0));
        assertThat(c.timeAxis()[0], is(0.01));
        assertThat(c.timeAxis()[1], is(1000.0));
        assertThat("current axis logarithmic", c.chart().getStyler().isXAxisLogarithmic(), is(true));
        assertThat("time axis logarithmic", c.chart().getStyler().isYAxisLogarithmic(), is(true));
        assertThat(c.currentAxisTitle(), is("Current at 0.4 kV"));
    }

    @Test
    void seriesHoldDeviceCableAndCrossing() {
        var names = c().getSeriesCollection().stream().map(XYSeries::getName).toList();
        assertThat(names, hasItems("R", "R minimum", "C damage limit", "C limit above 5 s", "C limit below 0.1 s",
                "C damaged"));
    }

    @Test
    void deviceSeriesStepsVerticallyAtTheDefiniteTimePickup() {
        XYSeries s = c().getSeries("R");
        double[] x = s.getXData();
        double[] y = s.getYData();
        boolean step = false;
        for (int i = 1; i < x.length; i++) {
            if (Math.abs(x[i] / x[i - 1] - 1) < 1e-6 && Math.abs(x[i] - 3000) < 1e-3
                    && Math.abs(y[i] - 0.15) < 1e-12 && y[i - 1] > 0.5) {
                step = true;
            }
        }
        assertThat("no vertical step at 3000 A from above 0.5 s to 0.15 s in " + java.util.Arrays.toString(x),
                step, is(true));
    }

    @Test
    void cableLimitInsideTheWindowRunsFromFiveSecondsToATenth() {
        XYSeries s = c().getSeries("C damage limit");
        double[] y = s.getYData();
        assertThat(y[0], closeTo(5.0, 1e-9));
        assertThat(y[y.length - 1], closeTo(0.1, 1e-9));
    }

    @Test
    void tickLabelsReadAsEngineersWriteThem() {
        assertThat(TimeCurrentChart.amps(10.0), is("10 A"));
        assertThat(TimeCurrentChart.amps(1000.0), is("1 kA"));
        assertThat(TimeCurrentChart.amps(100000.0), is("100 kA"));
        assertThat(TimeCurrentChart.seconds(0.01), is("0.01"));
        assertThat(TimeCurrentChart.seconds(1000.0), is("1000"));
    }

    private static org.knowm.xchart.XYChart c() {
        return chart().chart();
    }

    @Test
    void tickValuesReadAsTheFormattersThreeDecimalsWithoutTrailingZeros() {
        // the reference is java.util.Formatter's %.3f, trailing zeros and point stripped
        SplittableRandom r = new SplittableRandom(31);
        for (int n = 0; n < 20_000; n++) {
            double v = switch (n % 4) {
                case 0 -> Math.pow(10, r.nextDouble(-4, 7));
                case 1 -> Math.round(Math.pow(10, r.nextDouble(-1, 6))) / 1000.0 + 0.0005;
                case 2 -> (double) r.nextInt(0, 100_000);
                default -> Math.pow(10, r.nextInt(-3, 7)) * r.nextInt(1, 10);
            };
            String expected = String.format(Locale.ROOT, "%.3f", v).replaceAll("0+$", "").replaceAll("\\.$", "");
            assertThat(v + " s", TimeCurrentChart.trim(v), is(expected));
        }
    }
}
