package coordination.samples;

import coordination.core.Quantities;
import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.ConductorSizes;
import coordination.core.cable.Insulation;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.margin.CableCheck;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.CableChecker;
import coordination.core.margin.MarginRequirement;
import coordination.core.study.ReportWriter;
import coordination.plot.chart.ChartContent;
import coordination.plot.chart.TimeCurrentChart;
import coordination.plot.sheet.Drawing;
import coordination.plot.sheet.OutputFormat;
import coordination.plot.sheet.SheetWriter;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Checks the aeration blower feeder of the sample scenario from code, prints the result and its
 * JSON, finds the smallest IEC size the relay protects with a reused checker, and writes the
 * chart as a PNG.
 */
public final class LibraryExample {
    private LibraryExample() {
    }

    /**
     * Runs the example.
     *
     * @param args optional output folder (default {@code out})
     * @throws IOException if the chart cannot be written
     */
    public static void main(String[] args) throws IOException {
        // the feeder relay: very inverse stage and a definite-time high set, 50 ms breaker
        Relay relay = new Relay("B5-relay", List.of(
                InverseTimeStage.of(InverseTimeFamily.IEC_VERY_INVERSE, 160, 0.3),
                DefiniteTimeStage.definiteTime(1600, 0.4)), 1.0, 0.05);
        // a 25 mm² copper XLPE cable at the insulation's default temperatures (90 °C to 250 °C)
        CableThermalLimit cable = CableThermalLimit.of("B5-cable", ConductorMaterial.COPPER, Insulation.XLPE, 25, 1);

        CableCheckResult result = CableCheck.check(relay, cable, 1_000, 10_000, MarginRequirement.seconds(0.1));
        System.out.println(result);
        System.out.print(ReportWriter.write(result));

        // the same check over the IEC sizes, on one checker that allocates nothing from run to run
        CableChecker checker = new CableChecker();
        MarginRequirement margin = MarginRequirement.seconds(0.1);
        for (double mm2 : ConductorSizes.iecSizesMm2()) {
            CableThermalLimit candidate = CableThermalLimit.of("B5-cable", ConductorMaterial.COPPER, Insulation.XLPE,
                    mm2, 1);
            if (checker.run(relay, candidate, 1_000, 10_000, margin, null)) {
                System.out.println("smallest protected size: " + Quantities.significant(mm2, 3)
                        + " mm², minimum margin " + Quantities.significant(checker.minMarginSeconds(), 3) + " s");
                break;
            }
        }

        TimeCurrentChart chart = new TimeCurrentChart(new ChartContent("B5 with a 25 mm² cable", 0.4, List.of(relay),
                List.of(cable), 1_000, 10_000, List.of(result), List.of()), 800, 600);
        byte[] png = Drawing.render(OutputFormat.PNG, 800, 600, 150, chart::paint);
        Path out = Path.of(args.length > 0 ? args[0] : "out");
        SheetWriter.write(out, java.util.Map.of("library-example.png", png));
        System.out.println("wrote " + out.resolve("library-example.png"));
    }
}
