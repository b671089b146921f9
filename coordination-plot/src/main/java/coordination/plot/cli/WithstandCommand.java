package coordination.plot.cli;

import coordination.core.CoordinationException;
import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.ConductorSizes;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.internal.Checks;
import coordination.core.study.ReportJson;
import java.io.PrintStream;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
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

    @Option(names = "--conductor", required = true, paramLabel = "MATERIAL", description = "copper or aluminium")
    String conductor;

    @Option(names = "--insulation", required = true, paramLabel = "TYPE", description = "pvc, xlpe, epr, ...")
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

    @Option(names = "--method", paramLabel = "METHOD", description = "adiabatic, non-adiabatic or icea")
    String method = "adiabatic";

    @Option(names = "--output", paramLabel = "FORM", description = "text, csv or json (default: text)")
    String output = "text";

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
        if (!List.of("text", "csv", "json").contains(output)) {
            return bad("--output: found '" + output + "' - must be text, csv or json");
        }
        double[] ts = times == null ? DEFAULT_TIMES : times.stream().mapToDouble(Double::doubleValue).toArray();
        for (double t : ts) {
            if (!(t > 0) || !Double.isFinite(t)) {
                return bad("--time: found " + Checks.format(t) + " s - must be above 0 s");
            }
        }
        List<double[]> sizes = new ArrayList<>();
        List<String> labels = new ArrayList<>();
        if (size != null) {
            try {
                double mm2 = size.matches("\\s*[0-9.]+\\s*") ? Double.parseDouble(size.trim()) : ConductorSizes.parseMm2(size);
                sizes.add(new double[] {mm2});
                labels.add(size.matches("\\s*[0-9.]+\\s*") ? size.trim() + " mm²" : size.trim());
            } catch (CoordinationException | IllegalArgumentException e) {
                return bad("--size: " + e.getMessage());
            }
        } else {
            for (double s : ConductorSizes.iecSizesMm2()) {
                if (s >= 1.5 && s <= 630) {
                    sizes.add(new double[] {s});
                    labels.add(Checks.format(s) + " mm²");
                }
            }
        }
        List<CableThermalLimit> cables = new ArrayList<>();
        try {
            for (double[] s : sizes) {
                double ti = initial != null ? initial : ins.maxOperatingCelsius();
                double tf = finalC != null ? finalC : ins.shortCircuitCelsius(s[0]);
                cables.add(new CableThermalLimit("withstand", m, ins, s[0], parallel, ti, tf, tm));
            }
        } catch (IllegalArgumentException e) {
            return bad(e.getMessage().replace("cable 'withstand': ", ""));
        }
        switch (output) {
            case "csv" -> csv(cables, labels, ts);
            case "json" -> json(cables, labels, ts);
            default -> text(cables, labels, ts);
        }
        return ExitCodes.PASS;
    }

    private int bad(String message) {
        err.println("coordination withstand: " + message);
        return ExitCodes.BAD_INPUT;
    }

    private void text(List<CableThermalLimit> cables, List<String> labels, double[] ts) {
        CableThermalLimit first = cables.get(0);
        out.println("Withstand current in kA, " + first.material().key() + " / " + first.insulation().key()
                + (first.parallel() > 1 ? ", " + first.parallel() + " in parallel" : "") + ", " + first.method().key()
                + " (I = kS/sqrt(t))");
        StringBuilder h = new StringBuilder(String.format(Locale.ROOT, "%-12s %7s %11s", "size", "k", "from-to °C"));
        for (double t : ts) {
            h.append(String.format(Locale.ROOT, " %8s", Checks.format(t) + " s"));
        }
        out.println(h);
        for (int i = 0; i < cables.size(); i++) {
            CableThermalLimit c = cables.get(i);
            StringBuilder row = new StringBuilder(String.format(Locale.ROOT, "%-12s %7.1f %11s", labels.get(i), c.k(),
                    Checks.format(c.initialCelsius()) + "-" + Checks.format(c.finalCelsius())));
            for (double t : ts) {
                row.append(String.format(Locale.ROOT, " %8.2f", c.withstandAmps(t) / 1000));
            }
            out.println(row);
        }
    }

    private void csv(List<CableThermalLimit> cables, List<String> labels, double[] ts) {
        StringBuilder h = new StringBuilder("size,size_mm2,parallel,k,initial_c,final_c");
        for (double t : ts) {
            h.append(",withstand_").append(Checks.format(t).replace('.', '_')).append("s_a");
        }
        out.println(h);
        for (int i = 0; i < cables.size(); i++) {
            CableThermalLimit c = cables.get(i);
            StringBuilder row = new StringBuilder("\"" + labels.get(i) + "\"," + Checks.format(c.sizeMm2()) + ","
                    + c.parallel() + "," + c.k() + "," + c.initialCelsius() + "," + c.finalCelsius());
            for (double t : ts) {
                row.append(',').append(c.withstandAmps(t));
            }
            out.println(row);
        }
    }

    private void json(List<CableThermalLimit> cables, List<String> labels, double[] ts) {
        List<Object> rows = new ArrayList<>();
        for (int i = 0; i < cables.size(); i++) {
            CableThermalLimit c = cables.get(i);
            Map<String, Object> r = new LinkedHashMap<>();
            r.put("size", labels.get(i));
            r.put("size_mm2", c.sizeMm2());
            r.put("parallel", c.parallel());
            r.put("k", c.k());
            r.put("initial_c", c.initialCelsius());
            r.put("final_c", c.finalCelsius());
            r.put("i2t_a2s", c.i2tA2s());
            List<Object> w = new ArrayList<>();
            for (double t : ts) {
                Map<String, Object> e = new LinkedHashMap<>();
                e.put("time_s", t);
                e.put("withstand_a", c.withstandAmps(t));
                w.add(e);
            }
            r.put("withstand", w);
            rows.add(r);
        }
        Map<String, Object> top = new LinkedHashMap<>();
        top.put("conductor", cables.get(0).material().key());
        top.put("insulation", cables.get(0).insulation().key());
        top.put("method", cables.get(0).method().key());
        top.put("sizes", rows);
        out.print(ReportJson.write(top));
    }
}
