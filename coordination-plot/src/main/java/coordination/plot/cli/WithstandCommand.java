package coordination.plot.cli;

import coordination.core.CoordinationException;
import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.ConductorSizes;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.cable.WithstandTable;
import coordination.core.study.ReportWriter;
import coordination.core.Quantities;
import java.io.PrintStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code coordination withstand}: the short-circuit withstand current of cables. */
@Command(name = "withstand", mixinStandardHelpOptions = true,
        description = "Prints the current a conductor withstands for given fault durations (I = kS/sqrt(t)),"
                + " for one size or the IEC 60228 series.")
final class WithstandCommand implements Callable<Integer> {
    private static final double[] DEFAULT_TIMES = {0.1, 0.2, 0.5, 1, 2, 5};

    private final PrintStream out;
    private final PrintStream err;

    @Option(names = "--conductor", required = true, paramLabel = "MATERIAL", completionCandidates = Materials.class,
            description = "${COMPLETION-CANDIDATES}")
    String conductor;

    @Option(names = "--insulation", required = true, paramLabel = "TYPE", completionCandidates = Insulations.class,
            description = "${COMPLETION-CANDIDATES}")
    String insulation;

    @Option(names = "--size", paramLabel = "SIZE", description = "mm² (70), or \"4/0 AWG\", \"250 kcmil\";"
            + " default: the IEC 60228 sizes from 1.5 to 630 mm²")
    String size;

    @Option(names = "--parallel", paramLabel = "N", description = "conductors in parallel (default: 1)")
    int parallel = 1;

    @Option(names = "--time", split = ",", paramLabel = "SECONDS", description = "fault durations in seconds"
            + " (default: 0.1,0.2,0.5,1,2,5)")
    List<Double> times;

    @Option(names = "--initial-c", paramLabel = "C", description = "initial temperature (default: insulation's)")
    Double initial;

    @Option(names = "--final-c", paramLabel = "C", description = "final temperature (default: insulation's)")
    Double finalC;

    @Option(names = "--method", paramLabel = "METHOD", completionCandidates = Methods.class,
            description = "${COMPLETION-CANDIDATES} (default: adiabatic)")
    String method = "adiabatic";

    @Option(names = "--output", paramLabel = "FORM", completionCandidates = Forms.class,
            description = "${COMPLETION-CANDIDATES} (default: text)")
    String output = "text";

    @Option(names = "--json", description = "the same as --output json")
    boolean json;

    /** The conductor materials' keys, for help and completion. */
    static final class Materials extends Keys {
        Materials() {
            super(java.util.Arrays.stream(ConductorMaterial.values()).map(ConductorMaterial::key).toList());
        }
    }

    /** The insulations' keys. */
    static final class Insulations extends Keys {
        Insulations() {
            super(java.util.Arrays.stream(Insulation.values()).map(Insulation::key).toList());
        }
    }

    /** The thermal methods' keys. */
    static final class Methods extends Keys {
        Methods() {
            super(java.util.Arrays.stream(ThermalMethod.values()).map(ThermalMethod::key).toList());
        }
    }

    /** The output forms. */
    static final class Forms extends Keys {
        Forms() {
            super(List.of("text", "csv", "json"));
        }
    }

    /** A fixed list of allowed values. */
    abstract static class Keys implements Iterable<String> {
        private final List<String> keys;

        Keys(List<String> keys) {
            this.keys = keys;
        }

        @Override
        public java.util.Iterator<String> iterator() {
            return keys.iterator();
        }
    }

    WithstandCommand(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
    }

    @Override
    public Integer call() {
        ConductorMaterial m = ConductorMaterial.byKey(conductor);
        Insulation ins = Insulation.byKey(insulation);
        ThermalMethod tm = ThermalMethod.byKey(method);
        if (m == null) {
            return bad("--conductor: found '" + conductor + "' - must be copper or aluminium");
        }
        if (ins == null) {
            return bad("--insulation: found '" + insulation + "' - must be one of " + Insulation.keys());
        }
        if (tm == null) {
            return bad("--method: found '" + method + "' - must be adiabatic, non-adiabatic or icea");
        }
        if (json) {
            output = "json";
        }
        if (!List.of("text", "csv", "json").contains(output)) {
            return bad("--output: found '" + output + "' - must be text, csv or json");
        }
        double[] ts = times == null ? DEFAULT_TIMES : times.stream().mapToDouble(Double::doubleValue).toArray();
        for (double t : ts) {
            if (!(t > 0) || !Double.isFinite(t)) {
                return bad("--time: found " + Quantities.asGiven(t) + " s - must be above 0 s");
            }
        }
        List<Double> sizes = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        if (size != null) {
            try {
                boolean plain = size.matches("\\s*[0-9.]+\\s*");
                sizes.add(plain ? Double.parseDouble(size.trim()) : ConductorSizes.parseMm2(size));
                labels.add(plain ? size.trim() + " mm²" : size.trim());
            } catch (CoordinationException | IllegalArgumentException e) {
                return bad("--size: " + e.getMessage());
            }
        } else {
            for (double s : ConductorSizes.iecSizesMm2()) {
                if (s >= 1.5 && s <= 630) {
                    sizes.add(s);
                    labels.add(Quantities.asGiven(s) + " mm²");
                }
            }
        }
        WithstandTable table;
        try {
            table = WithstandTable.of(m, ins, tm, parallel, sizes.stream().mapToDouble(Double::doubleValue).toArray(),
                    labels, initial == null ? OptionalDouble.empty() : OptionalDouble.of(initial),
                    finalC == null ? OptionalDouble.empty() : OptionalDouble.of(finalC), ts);
        } catch (IllegalArgumentException e) {
            return bad(e.getMessage().replace("cable 'withstand': ", ""));
        }
        switch (output) {
            case "csv" -> csv(table);
            case "json" -> out.print(ReportWriter.write(table));
            default -> text(table);
        }
        return ExitCodes.PASS;
    }

    private int bad(String message) {
        err.println("coordination withstand: " + message);
        return ExitCodes.BAD_INPUT;
    }

    private void text(WithstandTable table) {
        double[] ts = table.timesSeconds();
        CableThermalLimit first = table.rows().get(0).cable();
        out.println("Withstand current in kA, " + first.material().key() + " / " + first.insulation().key()
                + (first.parallel() > 1 ? ", " + first.parallel() + " in parallel" : "") + ", " + first.method().key()
                + " (I = kS/sqrt(t))");
        StringBuilder h = new StringBuilder(String.format(Locale.ROOT, "%-12s %7s %11s", "size", "k", "from-to °C"));
        for (double t : ts) {
            h.append(String.format(Locale.ROOT, " %8s", Quantities.asGiven(t) + " s"));
        }
        out.println(h);
        for (WithstandTable.Row r : table.rows()) {
            CableThermalLimit c = r.cable();
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%-12s %7.1f %11s", r.label(), c.k(),
                    Quantities.asGiven(c.initialCelsius()) + "-" + Quantities.asGiven(c.finalCelsius())));
            for (double a : r.withstandAmps(ts)) {
                row.append(String.format(Locale.ROOT, " %8.2f", a / 1000));
            }
            out.println(row);
        }
    }

    private void csv(WithstandTable table) {
        double[] ts = table.timesSeconds();
        StringBuilder h = new StringBuilder("size,size_mm2,parallel,k,initial_c,final_c");
        for (double t : ts) {
            h.append(",withstand_").append(Quantities.asGiven(t).replace('.', '_')).append("s_a");
        }
        out.println(h);
        for (WithstandTable.Row r : table.rows()) {
            CableThermalLimit c = r.cable();
            StringBuilder row = new StringBuilder("\"" + r.label() + "\"," + Quantities.asGiven(c.sizeMm2()) + ","
                    + c.parallel() + "," + c.k() + "," + c.initialCelsius() + "," + c.finalCelsius());
            for (double a : r.withstandAmps(ts)) {
                row.append(',').append(a);
            }
            out.println(row);
        }
    }
}
