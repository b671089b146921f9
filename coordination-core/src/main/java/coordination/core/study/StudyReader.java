package coordination.core.study;

import coordination.core.CoordinationException;
import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.ConductorSizes;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.Fuse;
import coordination.core.curve.HighCurrentBehaviour;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.McbType;
import coordination.core.curve.MiniatureBreaker;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.Relay;
import coordination.core.curve.TabulatedCurve;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.curve.TripUnitBreaker;
import coordination.core.internal.Checks;
import coordination.core.margin.DcOffset;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import java.io.IOException;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.OptionalDouble;

/**
 * Reads study files (format 1, {@code spec/study-format.md}). Every problem of a file is collected
 * and thrown at once as a {@link StudyFileException}; each names the file, line, column and key.
 */
public final class StudyReader {
    /** Largest study file read, in bytes: a study is a few kilobytes. */
    public static final long MAX_FILE_BYTES = 1 << 20;
    /** Most points accepted on one digitised curve. */
    public static final int MAX_POINTS = 500;
    /** Most cables, devices or checks accepted in one study. */
    public static final int MAX_ITEMS = 200;

    private static final List<String> CURVES = curveKeys();
    private static final List<String> TYPES = List.of("relay", "fuse", "breaker", "mcb");

    private final String file;
    private final List<Problem> problems = new ArrayList<>();
    private final Binder b;
    private final java.util.Set<String> declared = new java.util.HashSet<>();
    private double studyKv = Double.NaN;
    private double frequency = 50;

    private StudyReader(String file) {
        this.file = file;
        this.b = new Binder(file, problems);
    }

    private static List<String> curveKeys() {
        List<String> k = new ArrayList<>();
        for (InverseTimeFamily f : InverseTimeFamily.values()) {
            k.add(f.key());
        }
        k.add("custom");
        k.add("definite-time");
        k.add("instantaneous");
        return List.copyOf(k);
    }

    /**
     * Reads a study file.
     *
     * @param path the file
     * @return the study
     * @throws StudyFileException with every problem found, if the file cannot be used
     */
    public static Study read(Path path) {
        String shown = path.toString();
        String name = path.getFileName() == null ? "study" : path.getFileName().toString();
        int dot = name.lastIndexOf('.');
        String base = dot > 0 ? name.substring(0, dot) : name;
        try {
            long size = Files.size(path);
            if (size > MAX_FILE_BYTES) {
                throw single(shown, "the file is " + size + " bytes - study files are limited to " + MAX_FILE_BYTES
                        + " bytes (1 MiB)");
            }
            byte[] bytes = Files.readAllBytes(path);
            if (bytes.length > MAX_FILE_BYTES) {
                throw single(shown, "the file is over " + MAX_FILE_BYTES + " bytes - study files are limited to 1 MiB");
            }
            String text;
            try {
                text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                        .onUnmappableCharacter(CodingErrorAction.REPORT).decode(java.nio.ByteBuffer.wrap(bytes))
                        .toString();
            } catch (CharacterCodingException e) {
                throw single(shown, "the file is not UTF-8 text");
            }
            return parse(shown, base, text);
        } catch (IOException e) {
            throw single(shown, "cannot read the file: " + e.getMessage());
        }
    }

    private static StudyFileException single(String file, String message) {
        return new StudyFileException(List.of(new Problem(file, 1, 1, "", message)));
    }

    /**
     * Reads a study from text.
     *
     * @param file the name to show in problems
     * @param name the study's name for its outputs
     * @param text the YAML text
     * @return the study
     * @throws StudyFileException with every problem found
     */
    public static Study parse(String file, String name, String text) {
        if (text.length() > MAX_FILE_BYTES) {
            throw single(file, "the text is over " + MAX_FILE_BYTES + " characters - study files are limited to 1 MiB");
        }
        if (text.indexOf('\0') >= 0) {
            throw single(file, "the file holds a NUL character - study files are YAML text");
        }
        StudyReader r = new StudyReader(file);
        Node root = new YamlTreeReader(file, r.problems).read(text);
        Study study = null;
        // problems of the tree itself (syntax, duplicates, anchors, aliases) leave values missing, and
        // binding would only echo them
        if (root != null && r.problems.isEmpty()) {
            study = r.study(root, name);
        }
        if (!r.problems.isEmpty() || study == null) {
            List<Problem> sorted = new ArrayList<>(r.problems);
            sorted.sort((x, y) -> x.line() != y.line() ? Integer.compare(x.line(), y.line())
                    : Integer.compare(x.column(), y.column()));
            if (sorted.isEmpty()) {
                sorted.add(new Problem(file, 1, 1, "", "the study could not be read"));
            }
            throw new StudyFileException(dedupe(sorted));
        }
        return study;
    }

    private static List<Problem> dedupe(List<Problem> problems) {
        List<Problem> out = new ArrayList<>();
        for (Problem p : problems) {
            if (!out.contains(p)) {
                out.add(p);
            }
        }
        return out;
    }

    private Study study(Node rootNode, String name) {
        Node.MapNode root = b.map(rootNode, "");
        if (root == null) {
            return null;
        }
        b.allowOnly(root, "", "format", "title", "voltage_kv", "frequency_hz", "revision", "date", "page", "cables",
                "devices", "checks");
        if (!b.has(root, "format")) {
            b.missing(root, "", "format", "write 'format: 1'");
        } else {
            Node f = b.value(root, "format");
            if (!(f instanceof Node.Scalar s && s.type() == Node.ScalarType.NUMBER && s.number() == 1)) {
                b.problem(f == null ? root : f, "format", "found " + (f == null ? "nothing" : f.kindName())
                        + " - this reader knows format 1 only");
                return null;
            }
        }
        String title = b.text(root, "", "title", true, "a title for the study");
        studyKv = b.number(root, "", "voltage_kv", true, Double.NaN, 0, true, 1000, "kV");
        frequency = b.number(root, "", "frequency_hz", false, 50, 1, false, 1000, "Hz");
        String revision = b.text(root, "", "revision", false, "");
        String date = b.has(root, "date") ? scalarText(root, "date") : null;
        String page = b.choice(root, "", "page", false, "a4", List.of("a4", "letter"));

        Map<String, Study.StudyCable> cables = new LinkedHashMap<>();
        Map<String, Node> cableIdNodes = new HashMap<>();
        List<Node> cableNodes = limited(b.optionalList(root, "", "cables"), root, "cables");
        for (int i = 0; i < cableNodes.size(); i++) {
            String path = "cables[" + i + "]";
            declare("cable", cableNodes.get(i));
            Study.StudyCable c = cable(cableNodes.get(i), path);
            if (c != null) {
                if (cables.containsKey(c.id())) {
                    b.problem(b.value((Node.MapNode) cableNodes.get(i), "id"), path + ".id", "duplicate id '" + c.id()
                            + "' - already used at line " + cableIdNodes.get(c.id()).line());
                } else {
                    cables.put(c.id(), c);
                    cableIdNodes.put(c.id(), b.value((Node.MapNode) cableNodes.get(i), "id"));
                }
            }
        }
        Map<String, Study.StudyDevice> devices = new LinkedHashMap<>();
        Map<String, Node> deviceIdNodes = new HashMap<>();
        List<Node> deviceNodes = limited(b.optionalList(root, "", "devices"), root, "devices");
        for (int i = 0; i < deviceNodes.size(); i++) {
            String path = "devices[" + i + "]";
            declare("device", deviceNodes.get(i));
            Study.StudyDevice d = device(deviceNodes.get(i), path);
            if (d != null) {
                if (devices.containsKey(d.id())) {
                    b.problem(b.value((Node.MapNode) deviceNodes.get(i), "id"), path + ".id", "duplicate id '" + d.id()
                            + "' - already used at line " + deviceIdNodes.get(d.id()).line());
                } else {
                    devices.put(d.id(), d);
                    deviceIdNodes.put(d.id(), b.value((Node.MapNode) deviceNodes.get(i), "id"));
                }
            }
        }
        List<Study.StudyCheck> checks = new ArrayList<>();
        List<Node> checkNodes = limited(b.optionalList(root, "", "checks"), root, "checks");
        for (int i = 0; i < checkNodes.size(); i++) {
            try {
                Study.StudyCheck c = check(checkNodes.get(i), "checks[" + i + "]", cables, devices);
                if (c != null) {
                    checks.add(c);
                }
            } catch (IllegalArgumentException e) {
                b.problem(checkNodes.get(i), "checks[" + i + "]", e.getMessage());
            }
        }
        if (!problems.isEmpty() || title == null) {
            return null;
        }
        return new Study(name, title, studyKv, frequency, revision == null ? "" : revision, date == null ? "" : date,
                "letter".equals(page) ? Study.PageSize.LETTER : Study.PageSize.A4, List.copyOf(cables.values()),
                List.copyOf(devices.values()), checks);
    }

    private void declare(String what, Node n) {
        if (n instanceof Node.MapNode m && b.value(m, "id") instanceof Node.Scalar s) {
            declared.add(what + ":" + s.text());
        }
    }

    private List<Node> limited(List<Node> items, Node.MapNode root, String key) {
        if (items.size() > MAX_ITEMS) {
            b.problem(b.value(root, key), key, "found " + items.size() + " entries - at most " + MAX_ITEMS
                    + " are accepted in one study");
            return List.of();
        }
        return items;
    }

    private String scalarText(Node.MapNode m, String key) {
        Node n = b.value(m, key);
        if (n instanceof Node.Scalar s && s.type() != Node.ScalarType.NULL) {
            return s.text();
        }
        b.problem(n == null ? m : n, key, "expected a date or text, found " + (n == null ? "nothing" : n.kindName()));
        return null;
    }

    // ---------------------------------------------------------------------------------------- cables

    private Study.StudyCable cable(Node n, String path) {
        Node.MapNode m = b.map(n, path);
        if (m == null) {
            return null;
        }
        int before = b.problemCount();
        b.allowOnly(m, path, "id", "conductor", "insulation", "size_mm2", "size", "parallel", "initial_c", "final_c",
                "load", "method", "fault_ka");
        String id = b.text(m, path, "id", true, "every cable needs an id");
        String conductor = b.choice(m, path, "conductor", true, null, List.of("copper", "aluminium", "aluminum"));
        List<String> insulations = new ArrayList<>();
        for (Insulation i : Insulation.values()) {
            insulations.add(i.key());
        }
        String insulation = b.choice(m, path, "insulation", true, null, insulations);
        double size = Double.NaN;
        String sizeText = null;
        if (b.has(m, "size_mm2") && b.has(m, "size")) {
            b.problem(b.value(m, "size"), path + ".size", "give either size_mm2 or size, not both");
        } else if (b.has(m, "size_mm2")) {
            size = b.number(m, path, "size_mm2", true, Double.NaN, 0, true, 10000, "mm2");
            sizeText = Checks.format(size) + " mm²";
        } else if (b.has(m, "size")) {
            String s = b.text(m, path, "size", true, "");
            if (s != null) {
                try {
                    size = ConductorSizes.parseMm2(s);
                    sizeText = s.trim();
                } catch (CoordinationException | IllegalArgumentException e) {
                    b.problem(b.value(m, "size"), path + ".size", e.getMessage());
                }
            }
        } else {
            b.missing(m, path, "size_mm2", "give size_mm2 (mm²) or size (\"4/0 AWG\", \"250 kcmil\")");
        }
        int parallel = b.integer(m, path, "parallel", 1, 1, 100);
        String method = b.choice(m, path, "method", false, "adiabatic", List.of("adiabatic", "non-adiabatic", "icea"));
        double[] fault = b.rangeKa(m, path, "fault_ka", false);
        if (b.problemCount() > before || id == null || conductor == null || insulation == null || Double.isNaN(size)) {
            // the temperatures depend on the insulation and size; still check their own form
            b.number(m, path, "initial_c", false, 0, -50, false, 400, "°C");
            b.number(m, path, "final_c", false, 0, -50, false, 1000, "°C");
            return null;
        }
        Insulation ins = Insulation.byKey(insulation);
        double initial;
        if (b.has(m, "load") && b.has(m, "initial_c")) {
            b.problem(b.value(m, "load"), path + ".load", "give either initial_c or load, not both");
            return null;
        } else if (b.has(m, "load")) {
            initial = loadTemperature(m, path, ins);
        } else {
            initial = b.number(m, path, "initial_c", false, ins.maxOperatingCelsius(), -50, false, 400, "°C");
        }
        double fin = b.number(m, path, "final_c", false, ins.shortCircuitCelsius(size), -50, false, 1000, "°C");
        if (Double.isNaN(initial) || Double.isNaN(fin) || parallel == Integer.MIN_VALUE) {
            return null;
        }
        if (!(fin > initial)) {
            Node at = b.has(m, "initial_c") ? b.value(m, "initial_c") : b.has(m, "final_c") ? b.value(m, "final_c") : m;
            b.problem(at, path + (b.has(m, "initial_c") ? ".initial_c" : ".final_c"), "initial temperature "
                    + Checks.format(initial) + " °C is not below the final temperature " + Checks.format(fin)
                    + " °C - the initial temperature must be below the final one");
            return null;
        }
        try {
            CableThermalLimit limit = new CableThermalLimit(id, ConductorMaterial.byKey(conductor), ins, size, parallel,
                    initial, fin, ThermalMethod.byKey(method));
            return new Study.StudyCable(limit, sizeText, fault == null ? Double.NaN : fault[0],
                    fault == null ? Double.NaN : fault[1]);
        } catch (IllegalArgumentException e) {
            b.problem(m, path, e.getMessage());
            return null;
        }
    }

    private double loadTemperature(Node.MapNode m, String path, Insulation ins) {
        String p = path + ".load";
        Node.MapNode load = b.map(b.value(m, "load"), p);
        if (load == null) {
            return Double.NaN;
        }
        b.allowOnly(load, p, "current_a", "rated_a", "ambient_c");
        double current = b.number(load, p, "current_a", true, Double.NaN, 0, false, 1e6, "A");
        double rated = b.number(load, p, "rated_a", true, Double.NaN, 0, true, 1e6, "A");
        double ambient = b.number(load, p, "ambient_c", false, 30, -50, false, 100, "°C");
        if (Double.isNaN(current) || Double.isNaN(rated) || Double.isNaN(ambient)) {
            return Double.NaN;
        }
        return CableThermalLimit.initialFromLoad(ambient, ins.maxOperatingCelsius(), current, rated);
    }

    // --------------------------------------------------------------------------------------- devices

    private Study.StudyDevice device(Node n, String path) {
        Node.MapNode m = b.map(n, path);
        if (m == null) {
            return null;
        }
        String type = b.choice(m, path, "type", true, null, TYPES);
        String id = b.text(m, path, "id", true, "every device needs an id");
        if (type == null) {
            return null;
        }
        double kv = b.number(m, path, "voltage_kv", false, studyKv, 0, true, 1000, "kV");
        int before = b.problemCount();
        List<String> settings = new ArrayList<>();
        ProtectiveDevice device;
        try {
            device = switch (type) {
                case "relay" -> relay(m, path, id, settings);
                case "fuse" -> fuse(m, path, id, settings);
                case "breaker" -> breaker(m, path, id, settings);
                default -> mcb(m, path, id, settings);
            };
        } catch (IllegalArgumentException e) {
            // a combination of settings the model refuses, each valid on its own
            b.problem(m, path, e.getMessage());
            return null;
        }
        if (device == null || id == null || Double.isNaN(kv) || b.problemCount() > before) {
            return null;
        }
        double factor = Double.isNaN(studyKv) ? 1.0 : kv / studyKv;
        if (factor != 1.0) {
            settings.add("at " + Checks.format(kv) + " kV: currents x" + Checks.format(factor) + " on the chart");
        }
        return new Study.StudyDevice(device, kv, device.referredBy(factor), settings);
    }

    private ProtectiveDevice relay(Node.MapNode m, String path, String id, List<String> settings) {
        b.allowOnly(m, path, "id", "type", "voltage_kv", "breaker_s", "ct", "stages");
        double breaker = b.number(m, path, "breaker_s", false, 0, 0, false, 10, "s");
        double ratio = 1;
        String ctText = "";
        if (b.has(m, "ct")) {
            String p = path + ".ct";
            Node.MapNode ct = b.map(b.value(m, "ct"), p);
            if (ct != null) {
                b.allowOnly(ct, p, "primary_a", "secondary_a");
                double pri = b.number(ct, p, "primary_a", true, Double.NaN, 0, true, 1e6, "A");
                double sec = b.number(ct, p, "secondary_a", true, Double.NaN, 0, true, 100, "A");
                ratio = pri / sec;
                ctText = "CT " + Checks.format(pri) + "/" + Checks.format(sec) + " A, settings in secondary A";
            } else {
                ratio = Double.NaN;
            }
        }
        if (!b.has(m, "stages")) {
            b.missing(m, path, "stages", "a relay needs at least one stage");
            return null;
        }
        List<Node> stageNodes = b.list(b.value(m, "stages"), path + ".stages");
        if (stageNodes == null) {
            return null;
        }
        if (stageNodes.isEmpty()) {
            b.problem(b.value(m, "stages"), path + ".stages", "found no stages - a relay needs at least one");
            return null;
        }
        if (stageNodes.size() > 10) {
            b.problem(b.value(m, "stages"), path + ".stages", "found " + stageNodes.size()
                    + " stages - at most 10 are accepted");
            return null;
        }
        List<TimeCurrentCurve> stages = new ArrayList<>();
        for (int i = 0; i < stageNodes.size(); i++) {
            TimeCurrentCurve s = stage(stageNodes.get(i), path + ".stages[" + i + "]", settings);
            if (s != null) {
                stages.add(s);
            }
        }
        if (stages.size() != stageNodes.size() || Double.isNaN(breaker) || Double.isNaN(ratio) || id == null) {
            return null;
        }
        if (!ctText.isEmpty()) {
            settings.add(ctText);
        }
        if (breaker > 0) {
            settings.add("breaker interrupting time " + Checks.format(breaker) + " s");
        }
        return new Relay(id, stages, ratio, breaker);
    }

    private TimeCurrentCurve stage(Node n, String path, List<String> settings) {
        Node.MapNode m = b.map(n, path);
        if (m == null) {
            return null;
        }
        String curve = b.choice(m, path, "curve", true, null, CURVES);
        if (curve == null) {
            return null;
        }
        double pickup = b.number(m, path, "pickup_a", true, Double.NaN, 0, true, 1e6, "A");
        switch (curve) {
            case "definite-time" -> {
                b.allowOnly(m, path, "curve", "pickup_a", "delay_s");
                double delay = b.number(m, path, "delay_s", true, Double.NaN, 0, false, 1000, "s");
                if (Double.isNaN(pickup) || Double.isNaN(delay)) {
                    return null;
                }
                settings.add("definite time: pickup " + Checks.format(pickup) + " A, delay " + Checks.format(delay) + " s");
                return DefiniteTimeStage.definiteTime(pickup, delay);
            }
            case "instantaneous" -> {
                b.allowOnly(m, path, "curve", "pickup_a", "delay_s");
                double delay = b.number(m, path, "delay_s", false, 0, 0, false, 1, "s");
                if (Double.isNaN(pickup) || Double.isNaN(delay)) {
                    return null;
                }
                settings.add("instantaneous: pickup " + Checks.format(pickup) + " A"
                        + (delay > 0 ? ", " + Checks.format(delay) + " s" : ""));
                return DefiniteTimeStage.instantaneous(pickup, delay);
            }
            default -> {
                return inverse(m, path, curve, pickup, settings);
            }
        }
    }

    private TimeCurrentCurve inverse(Node.MapNode m, String path, String curve, double pickup, List<String> settings) {
        boolean custom = curve.equals("custom");
        InverseTimeFamily family = InverseTimeFamily.byKey(curve);
        List<String> allowed = new ArrayList<>(List.of("curve", "pickup_a", "high_current", "upper_multiple"));
        String multiplierKey;
        if (custom) {
            allowed.addAll(List.of("a_s", "b_s", "p", "reset_s", "tms", "time_dial"));
            multiplierKey = b.has(m, "time_dial") ? "time_dial" : "tms";
            if (b.has(m, "time_dial") && b.has(m, "tms")) {
                b.problem(b.value(m, "time_dial"), path + ".time_dial", "give either tms or time_dial, not both");
            }
        } else {
            multiplierKey = family.isIeee() ? "time_dial" : "tms";
            allowed.add(multiplierKey);
            String other = family.isIeee() ? "tms" : "time_dial";
            if (b.has(m, other)) {
                b.problemAtKey(m.entries().get(other), path + "." + other, curve + " is set by " + multiplierKey
                        + ", not " + other);
                allowed.add(other);
            }
        }
        b.allowOnly(m, path, allowed.toArray(new String[0]));
        double multiplier = b.number(m, path, multiplierKey, true, Double.NaN, 0, true, 100, "");
        String hc = b.choice(m, path, "high_current", false, "follow", List.of("follow", "hold"));
        double upper = b.number(m, path, "upper_multiple", false, InverseTimeStage.STANDARD_UPPER_MULTIPLE, 1, true,
                1000, "");
        double a;
        double bb;
        double p;
        double reset;
        if (custom) {
            a = b.number(m, path, "a_s", true, Double.NaN, 0, true, 1e4, "s");
            bb = b.number(m, path, "b_s", false, 0, 0, false, 1e3, "s");
            p = b.number(m, path, "p", true, Double.NaN, 0, true, 10, "");
            reset = b.number(m, path, "reset_s", false, Double.NaN, 0, true, 1e4, "s");
            if (b.has(m, "reset_s") && Double.isNaN(reset)) {
                return null;
            }
        } else {
            a = family.aSeconds();
            bb = family.bSeconds();
            p = family.exponent();
            reset = family.resetSeconds();
        }
        if (Double.isNaN(pickup) || Double.isNaN(multiplier) || hc == null || Double.isNaN(upper) || Double.isNaN(a)
                || Double.isNaN(bb) || Double.isNaN(p)) {
            return null;
        }
        HighCurrentBehaviour behaviour = hc.equals("hold") ? HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE
                : HighCurrentBehaviour.FOLLOW_EQUATION;
        settings.add(curve + ": pickup " + Checks.format(pickup) + " A, " + multiplierKey.replace('_', ' ') + " "
                + Checks.format(multiplier) + (behaviour == HighCurrentBehaviour.HOLD_AT_UPPER_MULTIPLE
                ? ", held above " + Checks.format(upper) + "x" : ""));
        return new InverseTimeStage(a, bb, p, reset, pickup, multiplier, behaviour, upper, curve);
    }

    private ProtectiveDevice fuse(Node.MapNode m, String path, String id, List<String> settings) {
        b.allowOnly(m, path, "id", "type", "voltage_kv", "rating_a", "melting", "clearing", "clearing_i2t_a2s");
        double rating = b.number(m, path, "rating_a", true, Double.NaN, 0, true, 1e5, "A");
        double i2t = b.number(m, path, "clearing_i2t_a2s", false, Double.NaN, 0, true, 1e12, "A2s");
        if (b.has(m, "clearing_i2t_a2s") && Double.isNaN(i2t)) {
            return null;
        }
        String who = "fuse '" + id + "'";
        TabulatedCurve melting = tabulated(m, path, "melting", who + ": melting");
        TabulatedCurve clearing = tabulated(m, path, "clearing", who + ": clearing");
        if (Double.isNaN(rating) || melting == null || clearing == null || id == null) {
            return null;
        }
        try {
            Fuse f = new Fuse(id, rating, melting, clearing, Double.isNaN(i2t) ? OptionalDouble.empty()
                    : OptionalDouble.of(i2t));
            settings.add("rating " + Checks.format(rating) + " A, " + melting.amps().length + " melting and "
                    + clearing.amps().length + " clearing points");
            if (!Double.isNaN(i2t)) {
                settings.add("clearing I²t " + Checks.format(i2t) + " A²s");
            }
            return f;
        } catch (IllegalArgumentException e) {
            b.problem(b.value(m, "clearing"), path + ".clearing", e.getMessage());
            return null;
        }
    }

    private TabulatedCurve tabulated(Node.MapNode m, String path, String key, String label) {
        double[][] pts = b.points(m, path, key, true, MAX_POINTS);
        if (pts == null) {
            return null;
        }
        int bad = TabulatedCurve.violation(pts[0], pts[1]);
        if (bad >= 0) {
            List<Node> items = ((Node.ListNode) b.value(m, key)).items();
            b.problem(items.get(bad), path + "." + key + "[" + bad + "]", TabulatedCurve.problem(label, pts[0], pts[1]));
            return null;
        }
        return new TabulatedCurve(label, pts[0], pts[1]);
    }

    private ProtectiveDevice breaker(Node.MapNode m, String path, String id, List<String> settings) {
        b.allowOnly(m, path, "id", "type", "voltage_kv", "ir_a", "tr_s", "isd_a", "tsd_s", "tsd_i2t", "ii_a",
                "pickup_tolerance", "time_tolerance", "long_time_band", "instantaneous_s");
        double ir = b.number(m, path, "ir_a", true, Double.NaN, 0, true, 1e5, "A");
        double tr = b.number(m, path, "tr_s", true, Double.NaN, 0, true, 1000, "s");
        double isd = b.number(m, path, "isd_a", false, Double.POSITIVE_INFINITY, 0, true, 1e6, "A");
        double tsd = b.number(m, path, "tsd_s", b.has(m, "isd_a"), 0, 0, false, 10, "s");
        Boolean ramp = b.bool(m, path, "tsd_i2t", false);
        double ii = b.number(m, path, "ii_a", false, Double.POSITIVE_INFINITY, 0, true, 1e6, "A");
        double pt = b.number(m, path, "pickup_tolerance", false, 0.10, 0, false, 0.5, "");
        double tt = b.number(m, path, "time_tolerance", false, 0.20, 0, false, 0.5, "");
        double[] band = pair(m, path, "long_time_band", new double[] {1.05, 1.30});
        double[] inst = pair(m, path, "instantaneous_s", new double[] {0.01, 0.05});
        if (Double.isNaN(ir) || Double.isNaN(tr) || Double.isNaN(isd) || Double.isNaN(tsd) || ramp == null
                || Double.isNaN(ii) || Double.isNaN(pt) || Double.isNaN(tt) || band == null || inst == null
                || id == null) {
            return null;
        }
        try {
            TripUnitBreaker.Settings s = new TripUnitBreaker.Settings(ir, tr, isd, tsd, ramp, ii, inst[0], inst[1],
                    band[0], band[1], pt, tt);
            settings.add("long time: Ir " + Checks.format(ir) + " A, tr " + Checks.format(tr) + " s at 6 Ir");
            if (Double.isFinite(isd)) {
                settings.add("short time: Isd " + Checks.format(isd) + " A, tsd " + Checks.format(tsd) + " s"
                        + (ramp ? ", I²t on" : ""));
            }
            if (Double.isFinite(ii)) {
                settings.add("instantaneous: Ii " + Checks.format(ii) + " A");
            }
            settings.add("tolerance: pickup ±" + Checks.format(pt * 100) + " %, time ±" + Checks.format(tt * 100) + " %");
            return new TripUnitBreaker(id, s);
        } catch (IllegalArgumentException e) {
            b.problem(m, path, e.getMessage());
            return null;
        }
    }

    private double[] pair(Node.MapNode m, String path, String key, double[] dflt) {
        Node n = b.value(m, key);
        if (n == null && !b.has(m, key)) {
            return dflt;
        }
        List<Node> items = b.list(n == null ? m : n, path + "." + key);
        if (items == null) {
            return null;
        }
        if (items.size() != 2) {
            b.problem(n, path + "." + key, "expected two numbers [low, high], found a list of " + items.size());
            return null;
        }
        double lo = b.number(items.get(0), path + "." + key + "[0]", 0, false, 10, "");
        double hi = b.number(items.get(1), path + "." + key + "[1]", 0, false, 10, "");
        if (Double.isNaN(lo) || Double.isNaN(hi)) {
            return null;
        }
        if (hi < lo) {
            b.problem(items.get(1), path + "." + key + "[1]", "found " + Checks.format(hi)
                    + " - must be at or above the first value, " + Checks.format(lo));
            return null;
        }
        return new double[] {lo, hi};
    }

    private ProtectiveDevice mcb(Node.MapNode m, String path, String id, List<String> settings) {
        b.allowOnly(m, path, "id", "type", "voltage_kv", "curve_type", "rating_a", "fastest_s", "let_through_i2t_a2s");
        String t = b.choice(m, path, "curve_type", true, null, List.of("B", "C", "D"));
        double rating = b.number(m, path, "rating_a", true, Double.NaN, 0, true, 125, "A");
        double fastest = b.number(m, path, "fastest_s", false, MiniatureBreaker.DEFAULT_FASTEST_SECONDS, 0, false, 0.1,
                "s");
        double i2t = b.number(m, path, "let_through_i2t_a2s", false, Double.NaN, 0, true, 1e9, "A2s");
        if (t == null || Double.isNaN(rating) || Double.isNaN(fastest) || id == null
                || b.has(m, "let_through_i2t_a2s") && Double.isNaN(i2t)) {
            return null;
        }
        settings.add("type " + t + ", In " + Checks.format(rating) + " A (IEC 60898-1)");
        if (!Double.isNaN(i2t)) {
            settings.add("let-through I²t " + Checks.format(i2t) + " A²s");
        }
        return new MiniatureBreaker(id, McbType.valueOf(t), rating, fastest, i2t);
    }

    // ---------------------------------------------------------------------------------------- checks

    private Study.StudyCheck check(Node n, String path, Map<String, Study.StudyCable> cables,
            Map<String, Study.StudyDevice> devices) {
        Node.MapNode m = b.map(n, path);
        if (m == null) {
            return null;
        }
        if (b.has(m, "cable") || b.has(m, "device")) {
            b.allowOnly(m, path, "cable", "device", "margin_s", "margin_ratio", "range_ka", "dc_offset");
            String cable = reference(m, path, "cable", cables.keySet(), "cable");
            String device = reference(m, path, "device", devices.keySet(), "device");
            MarginRequirement req = MarginRequirement.seconds(0);
            if (b.has(m, "margin_s") && b.has(m, "margin_ratio")) {
                b.problem(b.value(m, "margin_ratio"), path + ".margin_ratio", "give either margin_s or margin_ratio, not both");
                return null;
            } else if (b.has(m, "margin_ratio")) {
                double r = b.number(m, path, "margin_ratio", true, Double.NaN, 1, false, 1e6, "");
                req = Double.isNaN(r) ? null : MarginRequirement.ratio(r);
            } else {
                double s = b.number(m, path, "margin_s", false, 0, 0, false, 1e4, "s");
                req = Double.isNaN(s) ? null : MarginRequirement.seconds(s);
            }
            double[] range = b.rangeKa(m, path, "range_ka", false);
            DcOffset dc = null;
            if (b.has(m, "dc_offset")) {
                String p = path + ".dc_offset";
                Node.MapNode d = b.map(b.value(m, "dc_offset"), p);
                if (d == null) {
                    return null;
                }
                b.allowOnly(d, p, "kappa");
                double kappa = b.number(d, p, "kappa", true, Double.NaN, 1, true, 2, "");
                if (Double.isNaN(kappa) || Double.isNaN(frequency)) {
                    return null;
                }
                dc = new DcOffset(kappa, frequency);
            }
            if (cable == null || device == null || req == null || b.has(m, "range_ka") && range == null) {
                return null;
            }
            if (range == null) {
                Study.StudyCable c = cables.get(cable);
                if (Double.isNaN(c.faultMinAmps())) {
                    b.problem(m, path + ".range_ka", "missing - cable '" + cable
                            + "' has no fault_ka, so the check needs its own range_ka");
                    return null;
                }
                range = new double[] {c.faultMinAmps(), c.faultMaxAmps()};
            }
            return new Study.CableCheckSpec(cable, device, req, range[0], range[1], dc);
        }
        if (b.has(m, "upstream") || b.has(m, "downstream")) {
            b.allowOnly(m, path, "upstream", "downstream", "interval_s", "rating_ratio", "no_overlap", "range_ka");
            String up = reference(m, path, "upstream", devices.keySet(), "device");
            String down = reference(m, path, "downstream", devices.keySet(), "device");
            int given = (b.has(m, "interval_s") ? 1 : 0) + (b.has(m, "rating_ratio") ? 1 : 0)
                    + (b.has(m, "no_overlap") ? 1 : 0);
            GradingRequirement req = null;
            if (given > 1) {
                b.problem(m, path, "give one of interval_s, rating_ratio or no_overlap, not several");
            } else if (b.has(m, "rating_ratio")) {
                double r = b.number(m, path, "rating_ratio", true, Double.NaN, 1, false, 1000, "");
                req = Double.isNaN(r) ? null : GradingRequirement.ratingRatio(r);
                if (req != null && up != null && down != null && (!(devices.get(up).device() instanceof Fuse)
                        || !(devices.get(down).device() instanceof Fuse))) {
                    b.problem(b.value(m, "rating_ratio"), path + ".rating_ratio",
                            "a rating ratio applies to two fuses - use interval_s or no_overlap for other devices");
                    req = null;
                }
            } else if (b.has(m, "no_overlap")) {
                Boolean v = b.bool(m, path, "no_overlap", true);
                if (Boolean.FALSE.equals(v)) {
                    b.problem(b.value(m, "no_overlap"), path + ".no_overlap", "found false - write no_overlap: true, "
                            + "or give interval_s instead");
                } else if (v != null) {
                    req = GradingRequirement.noOverlap();
                }
            } else {
                double s = b.number(m, path, "interval_s", true, Double.NaN, 0, false, 100, "s");
                req = Double.isNaN(s) ? null : GradingRequirement.intervalSeconds(s);
            }
            double[] range = b.rangeKa(m, path, "range_ka", true);
            if (up != null && up.equals(down)) {
                b.problem(b.value(m, "downstream"), path + ".downstream", "the same device as upstream, '" + up + "'");
                return null;
            }
            if (up == null || down == null || req == null || range == null) {
                return null;
            }
            return new Study.GradingCheckSpec(up, down, req, range[0], range[1]);
        }
        b.problem(m, path, "a check names either cable and device (a cable check) or upstream and downstream"
                + " (a grading check)");
        return null;
    }

    private String reference(Node.MapNode m, String path, String key, java.util.Set<String> ids, String what) {
        String v = b.text(m, path, key, true, "the id of a " + what);
        if (v == null) {
            return null;
        }
        if (!ids.contains(v) && declared.contains(what + ":" + v)) {
            // declared but invalid: its own problems are reported where it is declared
            return null;
        }
        if (!ids.contains(v)) {
            // suggest among every declared id, valid or not: the author's typo is in this reference
            List<String> known = declared.stream().filter(d -> d.startsWith(what + ":"))
                    .map(d -> d.substring(what.length() + 1)).sorted().toList();
            String hint = Binder.suggestion(v, known.toArray(new String[0]));
            b.problem(b.value(m, key), Binder.join(path, key), "no " + what + " has the id '" + v + "'"
                    + (hint != null ? " - did you mean '" + hint + "'?" : known.isEmpty() ? " - the study has none"
                    : " - known: " + String.join(", ", known)));
            return null;
        }
        return v;
    }
}
