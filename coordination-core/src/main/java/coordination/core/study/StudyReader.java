package coordination.core.study;

import static coordination.core.study.Binder.NumberField.number;

import coordination.core.CoordinationException;
import coordination.core.cable.CableThermalLimit;
import coordination.core.cable.ConductorMaterial;
import coordination.core.cable.ConductorSizes;
import coordination.core.cable.Insulation;
import coordination.core.cable.ThermalMethod;
import coordination.core.curve.CurrentTransformer;
import coordination.core.curve.DefiniteTimeStage;
import coordination.core.curve.DeviceKind;
import coordination.core.curve.Fuse;
import coordination.core.curve.HighCurrentBehaviour;
import coordination.core.curve.InverseTimeFamily;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.McbType;
import coordination.core.curve.MiniatureBreaker;
import coordination.core.curve.MultiplierKind;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.Relay;
import coordination.core.curve.RelayTolerance;
import coordination.core.curve.SettingRange;
import coordination.core.curve.TabulatedCurve;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.curve.TripUnitBreaker;
import coordination.core.design.NoTrip;
import coordination.core.internal.Checks;
import coordination.core.margin.DcOffset;
import coordination.core.margin.GradingRequirement;
import coordination.core.margin.MarginRequirement;
import coordination.core.study.Binder.NumberField;
import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.Set;
import java.util.function.Function;

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
    /** Most stages accepted in one relay. */
    public static final int MAX_STAGES = 10;

    private static final String DEFINITE_TIME = "definite-time";
    private static final String INSTANTANEOUS = "instantaneous";
    private static final String CUSTOM = "custom";

    private static final Map<String, DeviceKind> TYPES = Binder.words(DeviceKind.values(), DeviceKind::key);
    private static final Map<String, String> CURVES = curveWords();
    private static final Map<String, ConductorMaterial> CONDUCTORS = conductorWords();
    private static final Map<String, Insulation> INSULATIONS = Binder.words(Insulation.values(), Insulation::key);
    private static final Map<String, ThermalMethod> METHODS = Binder.words(ThermalMethod.values(), ThermalMethod::key);
    private static final Map<String, Study.PageSize> PAGES = Binder.words(Study.PageSize.values(), Study.PageSize::key);
    private static final Map<String, McbType> MCB_TYPES = Binder.words(McbType.values(), McbType::name);
    /** Utilization categories of IEC 60269-1 (from memory). */
    private static final Map<String, String> FUSE_CATEGORIES = Binder.words(new String[] {"gG", "gM", "aM", "gR", "aR",
        "gD", "gN", "gU"}, w -> w);
    private static final Map<String, HighCurrentBehaviour> HIGH_CURRENT = Binder.words(HighCurrentBehaviour.values(),
            HighCurrentBehaviour::key);

    private static final NumberField VOLTAGE = number("voltage_kv", "kV").above(0).to(1000);
    private static final NumberField FREQUENCY = number("frequency_hz", "Hz").from(1).to(1000).orElse(50);
    private static final NumberField SIZE = number("size_mm2", "mm2").above(0).to(10000).required();
    private static final NumberField PARALLEL = number("parallel", "").from(1).to(100).orElse(1);
    private static final NumberField INITIAL = number("initial_c", "°C").from(-50).to(400);
    private static final NumberField FINAL = number("final_c", "°C").from(-50).to(1000);
    private static final NumberField LOAD_CURRENT = number("current_a", "A").from(0).to(1e6).required();
    private static final NumberField LOAD_RATED = number("rated_a", "A").above(0).to(1e6).required();
    private static final NumberField LOAD_AMBIENT = number("ambient_c", "°C").from(-50).to(100).orElse(30);
    private static final NumberField BREAKER_TIME = number("breaker_s", "s").from(0).to(10).orElse(0);
    private static final NumberField CT_PRIMARY = number("primary_a", "A").above(0).to(1e6).required();
    private static final NumberField CT_SECONDARY = number("secondary_a", "A").above(0).to(100).required();
    private static final NumberField PICKUP = number("pickup_a", "A").above(0).to(1e6).required();
    private static final NumberField DT_DELAY = number("delay_s", "s").from(0).to(1000).required();
    private static final NumberField INST_DELAY = number("delay_s", "s").from(0).to(1);
    private static final NumberField TOL_TIME = number("time_percent", "%").from(0).to(50).required();
    private static final NumberField TOL_TIME_MIN = number("time_min_s", "s").from(0).to(1).orElse(0);
    private static final NumberField TOL_PICKUP = number("pickup_percent", "%").from(0).to(50).required();
    private static final NumberField MULTIPLIER_LIMITS = number("", "").above(0).to(100);
    private static final NumberField MULTIPLIER_STEP = number("", "").above(0).to(10);
    /** Longest sign-off field, in characters. */
    private static final int MAX_SIGN_OFF = 40;
    private static final NumberField PICKUP_STEP = number("pickup_step_a", "A").above(0).to(1e4);
    private static final NumberField LOAD = number("load_a", "A").above(0).to(1e6);
    private static final NumberField SENSITIVITY = number("sensitivity_factor", "").from(1).to(10)
            .orElse(Study.DesignLimits.DEFAULT_SENSITIVITY_FACTOR);
    private static final NumberField NO_TRIP_CURRENT = number("current_a", "A").above(0).to(1e6).required();
    private static final NumberField NO_TRIP_TIME = number("time_s", "s").above(0).to(1e4).required();
    private static final NumberField UPPER_MULTIPLE = number("upper_multiple", "").above(1).to(1000)
            .orElse(InverseTimeStage.STANDARD_UPPER_MULTIPLE);
    private static final NumberField CONSTANT_A = number("a_s", "s").above(0).to(1e4).required();
    private static final NumberField CONSTANT_B = number("b_s", "s").from(0).to(1e3).orElse(0);
    private static final NumberField EXPONENT = number("p", "").above(0).to(10).required();
    private static final NumberField RESET = number("reset_s", "s").above(0).to(1e4);
    private static final NumberField FUSE_RATING = number("rating_a", "A").above(0).to(1e5).required();
    private static final NumberField ENERGY_CONSTANT = number("", "A2s").above(0).to(1e12);
    private static final NumberField IR = number("ir_a", "A").above(0).to(1e5).required();
    private static final NumberField TR = number("tr_s", "s").above(0).to(1000).required();
    private static final NumberField ISD = number("isd_a", "A").above(0).to(1e6).orElse(Double.POSITIVE_INFINITY);
    private static final NumberField TSD = number("tsd_s", "s").from(0).to(10).orElse(0);
    private static final NumberField II = number("ii_a", "A").above(0).to(1e6).orElse(Double.POSITIVE_INFINITY);
    private static final NumberField PICKUP_TOLERANCE = number("pickup_tolerance", "").from(0).to(0.5)
            .orElse(TripUnitBreaker.DEFAULT_PICKUP_TOLERANCE);
    private static final NumberField TIME_TOLERANCE = number("time_tolerance", "").from(0).to(0.5).orElse(0.20);
    private static final NumberField PAIR_ITEM = number("", "").from(0).to(10);
    private static final NumberField MCB_RATING = number("rating_a", "A").above(0).to(125).required();
    private static final NumberField MCB_FASTEST = number("fastest_s", "s").from(0).to(0.1)
            .orElse(MiniatureBreaker.DEFAULT_FASTEST_SECONDS);
    private static final NumberField MARGIN_RATIO = number("margin_ratio", "").from(1).to(1e6).required();
    private static final NumberField MARGIN_SECONDS = number("margin_s", "s").from(0).to(1e4).orElse(0);
    private static final NumberField KAPPA = number("kappa", "").above(1).to(2).required();
    private static final NumberField X_OVER_R = number("x_r", "").above(0).to(1000).required();
    private static final Map<String, Boolean> INTERVAL_TO = intervalWords();
    /** Highest system voltage for which the library holds IEC 60949's non-adiabatic constants. */
    private static final double NON_ADIABATIC_MAX_KV = 3.0;
    private static final NumberField CABLE_VOLTAGE = number("voltage_kv", "kV").above(0).to(1000);
    private static final NumberField RATING_RATIO = number("rating_ratio", "").from(1).to(1000).required();
    private static final NumberField INTERVAL = number("interval_s", "s").from(0).to(100).required();

    private final Problems problems;
    private final Binder b;
    private final Set<String> declared = new HashSet<>();
    private OptionalDouble studyKv = OptionalDouble.empty();
    /** The design limits of the relay just read; none for other devices. */
    private Study.DesignLimits designLimits = Study.DesignLimits.NONE;
    private NetworkSection network;
    private boolean networkBuilt;
    private Map<String, Study.CableCheckSpec> derivedCables = Map.of();
    private Map<Derivation.Pair, List<Study.GradingCheckSpec>> derivedPairs = Map.of();
    private OptionalDouble frequency = OptionalDouble.empty();

    private StudyReader(String file) {
        this.problems = new Problems(file);
        this.b = new Binder(problems);
    }

    private static Map<String, String> curveWords() {
        Map<String, String> k = new LinkedHashMap<>();
        for (InverseTimeFamily f : InverseTimeFamily.values()) {
            k.put(f.key(), f.key());
        }
        for (String other : new String[] {CUSTOM, DEFINITE_TIME, INSTANTANEOUS}) {
            k.put(other, other);
        }
        return k;
    }

    private static Map<String, Boolean> intervalWords() {
        Map<String, Boolean> m = new LinkedHashMap<>();
        m.put("operating-time", false);
        m.put("clearing-time", true);
        return m;
    }

    private static Map<String, ConductorMaterial> conductorWords() {
        Map<String, ConductorMaterial> m = Binder.words(ConductorMaterial.values(), ConductorMaterial::key);
        m.put("aluminum", ConductorMaterial.ALUMINIUM);
        return m;
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
        String base = baseName(path);
        try {
            if (!Files.isRegularFile(path)) {
                throw single(shown, Files.exists(path) ? "not a regular file (a pipe, a device or a socket)"
                        : "no such file");
            }
            checkSize(shown, Files.size(path));
            try (InputStream in = Files.newInputStream(path)) {
                return read(in, shown, base);
            }
        } catch (java.nio.file.AccessDeniedException e) {
            throw single(shown, "cannot read the file: permission denied");
        } catch (java.nio.file.NoSuchFileException e) {
            throw single(shown, "cannot read the file: no such file");
        } catch (IOException e) {
            throw single(shown, "cannot read the file: " + e.getMessage());
        }
    }

    /**
     * Reads a study file whose bytes were read elsewhere (a batch engine's input), with the same checks and
     * messages as {@link #read(Path)}.
     *
     * @param path the file, for its name and the problems' file
     * @param content the file's bytes
     * @return the study
     * @throws StudyFileException with every problem found, if the file cannot be used
     */
    public static Study read(Path path, byte[] content) {
        String shown = path.toString();
        String base = baseName(path);
        checkSize(shown, content.length);
        try {
            return read(new java.io.ByteArrayInputStream(content), shown, base);
        } catch (IOException e) {
            throw new IllegalStateException("reading bytes in memory failed", e);
        }
    }

    /** The study's name from its file's name, which must be printable text. */
    private static String baseName(Path path) {
        String name = path.getFileName() == null ? "study" : path.getFileName().toString();
        Optional<TextRules.Refusal> badName = TextRules.check(name, false);
        if (badName.isPresent()) {
            throw single(path.toString(), "the file name " + badName.get().message() + "; rename the file");
        }
        int dot = name.lastIndexOf('.');
        return dot > 0 ? name.substring(0, dot) : name;
    }

    private static void checkSize(String shown, long size) {
        if (size > MAX_FILE_BYTES) {
            throw single(shown, "the file is " + size + " bytes - study files are limited to " + MAX_FILE_BYTES
                    + " bytes (1 MiB)");
        }
    }

    /**
     * Reads a study from a stream, such as standard input: at most 1 MiB of UTF-8 text.
     *
     * @param in the stream, read to its end (or just past the limit); not closed
     * @param file the name to show in problems
     * @param name the study's name for its outputs
     * @return the study
     * @throws StudyFileException with every problem found, or one for text too long or not UTF-8
     * @throws IOException if the stream cannot be read
     */
    public static Study read(InputStream in, String file, String name) throws IOException {
        // read at most one byte more than the limit, whatever size the source claims
        byte[] bytes = in.readNBytes((int) MAX_FILE_BYTES + 1);
        if (bytes.length > MAX_FILE_BYTES) {
            throw single(file, "the file is over " + MAX_FILE_BYTES + " bytes - study files are limited to 1 MiB");
        }
        String text;
        try {
            text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(java.nio.ByteBuffer.wrap(bytes))
                    .toString();
        } catch (CharacterCodingException e) {
            throw single(file, "the file is not UTF-8 text");
        }
        return parse(file, name, text);
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
        Optional<Study> study = Optional.empty();
        // problems of the tree itself (syntax, duplicates, anchors, aliases) leave values missing, and
        // binding would only echo them
        if (root != null && r.problems.isEmpty()) {
            study = r.study(root, name);
        }
        if (!r.problems.isEmpty() || study.isEmpty()) {
            if (r.problems.isEmpty()) {
                r.problems.add(1, 1, "", "the study could not be read");
            }
            throw new StudyFileException(r.problems.sorted());
        }
        return study.get();
    }

    private Optional<Study> study(Node rootNode, String name) {
        Optional<Node.MapNode> mapped = b.map(rootNode, "");
        if (mapped.isEmpty()) {
            return Optional.empty();
        }
        Node.MapNode root = mapped.get();
        b.allowOnly(root, "", "format", "title", "voltage_kv", "frequency_hz", "revision", "date", "page", "cables",
                "devices", "checks", "sign_off", "network");
        if (!b.has(root, "format")) {
            b.missing(root, "", "format", "write 'format: 1'");
        } else {
            Node f = b.value(root, "format");
            if (!(f instanceof Node.Scalar s && s.type() == Node.ScalarType.NUMBER && Binder.isDecimal(s)
                    && s.number() == 1)) {
                b.problem(f == null ? root : f, "format", "found " + (f == null ? "nothing" : f.kindName())
                        + " - this reader knows format 1 only");
                return Optional.empty();
            }
        }
        Optional<String> title = b.text(root, "", "title", "a title for the study");
        studyKv = b.number(root, "", VOLTAGE.required());
        frequency = b.number(root, "", FREQUENCY);
        Optional<String> revision = b.optionalText(root, "", "revision");
        Optional<String> date = b.has(root, "date") ? scalarText(root, "date") : Optional.empty();
        Optional<Study.PageSize> page = b.choice(root, "", "page", PAGES, Study.PageSize.A4);
        Study.SignOff signOff = signOff(root);

        network = new NetworkSection(b, root);
        Map<String, Study.StudyCable> cables = items(root, "cables", "cable", this::cable, Study.StudyCable::id);
        Map<String, Study.StudyDevice> devices = items(root, "devices", "device", this::device, Study.StudyDevice::id);
        Optional<Study.StudyNetwork> net = problems.isEmpty() ? network.build() : Optional.empty();
        networkBuilt = net.isPresent();
        Map<String, Study.CableCheckSpec> derivedCables = new LinkedHashMap<>();
        Map<Derivation.Pair, List<Study.GradingCheckSpec>> derivedPairs = new LinkedHashMap<>();
        List<Note> networkWarnings = new ArrayList<>();
        if (net.isPresent() && studyKv.isPresent() && frequency.isPresent()) {
            Derivation d = new Derivation(net.get(), devices, cables, studyKv.getAsDouble(), frequency.getAsDouble(),
                    network);
            derivedCables = d.cableChecks();
            derivedPairs = d.gradingChecks();
            networkWarnings.addAll(net.get().warnings());
            networkWarnings.addAll(d.warnings());
            // a cable without a stated fault range takes its derived one, for the chart and the design aids
            for (Study.CableCheckSpec c : derivedCables.values()) {
                Study.StudyCable cable = cables.get(c.cable());
                if (cable.fault().isEmpty()) {
                    cables.put(c.cable(), new Study.StudyCable(cable.limit(), cable.sizeText(), Optional.of(c.range()),
                            cable.initialSource(), cable.finalSource()));
                }
            }
        }
        this.derivedCables = derivedCables;
        this.derivedPairs = derivedPairs;
        List<Study.StudyCheck> explicit = new ArrayList<>();
        List<Study.Accepted> accepted = new ArrayList<>();
        List<Node> checkNodes = limited(b.optionalList(root, "", "checks"), root, "checks");
        for (int i = 0; i < checkNodes.size(); i++) {
            try {
                Node n = checkNodes.get(i);
                if (n instanceof Node.MapNode m && b.has(m, "accept")) {
                    accept(m, "checks[" + i + "]", devices).ifPresent(accepted::add);
                } else {
                    explicit.addAll(check(n, "checks[" + i + "]", cables, devices));
                }
            } catch (IllegalArgumentException e) {
                b.problem(checkNodes.get(i), "checks[" + i + "]", e.getMessage());
            }
        }
        List<Study.StudyCheck> checks = merge(explicit, accepted);
        if (!problems.isEmpty() || title.isEmpty()) {
            return Optional.empty();
        }
        Optional<Study.StudyNetwork> withAccepted = net.map(x -> new Study.StudyNetwork(x.network(), x.levels(),
                x.placements(), accepted, networkWarnings));
        return Optional.of(new Study(name, title.get(), studyKv.getAsDouble(), frequency.getAsDouble(), revision.orElse(""),
                date.orElse(""), page.orElseThrow(), List.copyOf(cables.values()), List.copyOf(devices.values()),
                checks, signOff, withAccepted));
    }

    /**
     * The checks to run: the derived ones, less those the study accepts or writes itself, then the
     * study's own in its order.
     */
    private List<Study.StudyCheck> merge(List<Study.StudyCheck> explicit, List<Study.Accepted> accepted) {
        List<Study.StudyCheck> out = new ArrayList<>();
        java.util.Set<String> written = new java.util.HashSet<>();
        for (Study.StudyCheck c : explicit) {
            if (c instanceof Study.CableCheckSpec cc) {
                written.add("cable:" + cc.cable() + ":" + cc.device());
            } else if (c instanceof Study.GradingCheckSpec g) {
                written.add("pair:" + g.upstream() + ":" + g.downstream());
            }
        }
        for (Study.CableCheckSpec c : derivedCables.values()) {
            if (!written.contains("cable:" + c.cable() + ":" + c.device())) {
                out.add(c);
            }
        }
        for (Map.Entry<Derivation.Pair, List<Study.GradingCheckSpec>> e : derivedPairs.entrySet()) {
            String key = "pair:" + e.getKey().upstream() + ":" + e.getKey().downstream();
            boolean isAccepted = accepted.stream().anyMatch(a -> a.upstream().equals(e.getKey().upstream())
                    && a.downstream().equals(e.getKey().downstream()));
            if (!written.contains(key) && !isAccepted) {
                out.addAll(e.getValue());
            }
        }
        out.addAll(explicit);
        return out;
    }

    /** {@code accept: {upstream, downstream, reason}}: a derived pair not meant to grade. */
    private Optional<Study.Accepted> accept(Node.MapNode m, String path, Map<String, Study.StudyDevice> devices) {
        b.allowOnly(m, path, "accept");
        String p = path + ".accept";
        Optional<Node.MapNode> a = b.map(b.value(m, "accept"), p);
        if (a.isEmpty()) {
            return Optional.empty();
        }
        b.allowOnly(a.get(), p, "upstream", "downstream", "reason");
        Optional<String> up = reference(a.get(), p, "upstream", devices.keySet(), "device");
        Optional<String> down = reference(a.get(), p, "downstream", devices.keySet(), "device");
        Optional<String> reason = b.text(a.get(), p, "reason", "why the pair is not meant to grade");
        if (up.isEmpty() || down.isEmpty() || reason.isEmpty()) {
            return Optional.empty();
        }
        if (!derivedPairs.containsKey(new Derivation.Pair(up.get(), down.get()))) {
            b.problem(a.get(), p, "'" + up.get() + "' over '" + down.get() + "' is not a pair the network derives"
                    + (network.present() ? "" : " (the study has no network section)") + " - only derived pairs can"
                    + " be accepted");
            return Optional.empty();
        }
        return Optional.of(new Study.Accepted(up.get(), down.get(), reason.get()));
    }

    /** The optional sign-off block: short texts, so that the title block shows them whole. */
    private Study.SignOff signOff(Node.MapNode root) {
        if (!b.has(root, "sign_off")) {
            return Study.SignOff.NONE;
        }
        Optional<Node.MapNode> m = b.map(b.value(root, "sign_off"), "sign_off");
        if (m.isEmpty()) {
            return Study.SignOff.NONE;
        }
        String[] keys = {"drawing", "prepared", "checked", "approved"};
        b.allowOnly(m.get(), "sign_off", keys);
        String[] v = new String[keys.length];
        for (int i = 0; i < keys.length; i++) {
            Optional<String> t = b.optionalText(m.get(), "sign_off", keys[i]);
            if (t.isPresent() && t.get().length() > MAX_SIGN_OFF) {
                b.problem(b.value(m.get(), keys[i]), "sign_off." + keys[i], "found " + t.get().length()
                        + " characters - at most " + MAX_SIGN_OFF + ", so that the title block shows it whole");
                t = Optional.empty();
            }
            v[i] = t.orElse("");
        }
        return new Study.SignOff(v[0], v[1], v[2], v[3]);
    }

    /** Reads the items of a list of identified things: each is declared, read and registered once by id. */
    private <T> Map<String, T> items(Node.MapNode root, String key, String what,
            java.util.function.BiFunction<Node, String, Optional<T>> reader, Function<T, String> id) {
        Map<String, T> found = new LinkedHashMap<>();
        Map<String, Node> idNodes = new HashMap<>();
        List<Node> nodes = limited(b.optionalList(root, "", key), root, key);
        for (int i = 0; i < nodes.size(); i++) {
            String path = key + "[" + i + "]";
            Node n = nodes.get(i);
            if (n instanceof Node.MapNode m && b.value(m, "id") instanceof Node.Scalar s) {
                declared.add(what + ":" + s.text());
            }
            Optional<T> item = reader.apply(n, path);
            if (item.isEmpty()) {
                continue;
            }
            String itemId = id.apply(item.get());
            Node idNode = b.value((Node.MapNode) n, "id");
            if (found.containsKey(itemId)) {
                b.problem(idNode, path + ".id", "duplicate id '" + itemId + "' - already used at line "
                        + idNodes.get(itemId).line());
            } else {
                found.put(itemId, item.get());
                idNodes.put(itemId, idNode);
            }
        }
        return found;
    }

    private List<Node> limited(List<Node> items, Node.MapNode root, String key) {
        if (items.size() > MAX_ITEMS) {
            b.problem(b.value(root, key), key, "found " + items.size() + " entries - at most " + MAX_ITEMS
                    + " are accepted in one study");
            return List.of();
        }
        return items;
    }

    private Optional<String> scalarText(Node.MapNode m, String key) {
        Node n = b.value(m, key);
        if (n instanceof Node.Scalar s && s.type() != Node.ScalarType.NULL) {
            if (s.text().length() > Binder.MAX_TEXT) {
                b.problem(n, key, "found text of " + s.text().length() + " characters - at most " + Binder.MAX_TEXT
                        + " are accepted");
                return Optional.empty();
            }
            return Optional.of(s.text());
        }
        b.problem(b.at(m, key), key, "expected a date or text, found " + (n == null ? "nothing" : n.kindName()));
        return Optional.empty();
    }

    // ---------------------------------------------------------------------------------------- cables

    private Optional<Study.StudyCable> cable(Node n, String path) {
        Optional<Node.MapNode> mapped = b.map(n, path);
        if (mapped.isEmpty()) {
            return Optional.empty();
        }
        Node.MapNode m = mapped.get();
        int before = b.problemCount();
        b.allowOnly(m, path, "id", "conductor", "insulation", "size_mm2", "size", "parallel", "initial_c", "final_c",
                "load", "method", "fault_ka", "voltage_kv", "from", "to", "length_m", "r_ohm_per_km", "x_ohm_per_km",
                "end_temperature_c");
        Optional<String> id = b.id(m, path, "every cable needs an id");
        Optional<ConductorMaterial> conductor = b.choice(m, path, "conductor", CONDUCTORS);
        Optional<Insulation> insulation = b.choice(m, path, "insulation", INSULATIONS);
        OptionalDouble size = OptionalDouble.empty();
        String sizeText = null;
        if (b.has(m, "size_mm2") && b.has(m, "size")) {
            b.problem(b.value(m, "size"), path + ".size", "give either size_mm2 or size, not both");
        } else if (b.has(m, "size_mm2")) {
            size = b.number(m, path, SIZE);
            sizeText = size.isPresent() ? Checks.format(size.getAsDouble()) + " mm²" : null;
        } else if (b.has(m, "size")) {
            Optional<String> s = b.text(m, path, "size", "");
            if (s.isPresent()) {
                try {
                    double mm2 = ConductorSizes.parseMm2(s.get());
                    if (mm2 > SIZE.max()) {
                        b.problem(b.value(m, "size"), path + ".size", "found " + s.get().trim() + ", "
                                + Checks.format(mm2) + " mm2 - must be at most " + Checks.format(SIZE.max()) + " mm2");
                    } else {
                        size = OptionalDouble.of(mm2);
                        sizeText = s.get().trim();
                    }
                } catch (CoordinationException | IllegalArgumentException e) {
                    b.problem(b.value(m, "size"), path + ".size", e.getMessage());
                }
            }
        } else {
            b.missing(m, path, "size_mm2", "give size_mm2 (mm²) or size (\"4/0 AWG\", \"250 kcmil\")");
        }
        OptionalInt parallel = b.integer(m, path, PARALLEL);
        Optional<ThermalMethod> method = b.choice(m, path, "method", METHODS, ThermalMethod.ADIABATIC);
        Optional<double[]> fault = b.rangeKa(m, path, "fault_ka", false);
        if (b.problemCount() > before || id.isEmpty() || conductor.isEmpty() || insulation.isEmpty()
                || size.isEmpty()) {
            // the temperatures depend on the insulation and size; still check their own form
            b.number(m, path, INITIAL);
            b.number(m, path, FINAL);
            return Optional.empty();
        }
        Insulation ins = insulation.get();
        double mm2 = size.getAsDouble();
        ThermalMethod tm = method.orElseThrow();
        OptionalDouble kv = studyKv.isPresent() ? b.number(m, path, CABLE_VOLTAGE.orElse(studyKv.getAsDouble()))
                : b.number(m, path, CABLE_VOLTAGE);
        if (kv.isEmpty()) {
            return Optional.empty();
        }
        if (tm == ThermalMethod.NON_ADIABATIC && kv.getAsDouble() > NON_ADIABATIC_MAX_KV) {
            b.problem(b.at(m, "method"), path + ".method", "the cable is for " + Checks.format(kv.getAsDouble())
                    + " kV; IEC 60949's non-adiabatic constants are held for cables up to 3 kV only - use adiabatic,"
                    + " which is conservative");
            return Optional.empty();
        }
        // each method takes its own standard's temperatures
        OptionalDouble defaultInitial = tm == ThermalMethod.ICEA ? ins.iceaOperatingCelsius()
                : OptionalDouble.of(ins.maxOperatingCelsius());
        OptionalDouble defaultFinal = tm == ThermalMethod.ICEA ? ins.iceaShortCircuitCelsius()
                : OptionalDouble.of(ins.shortCircuitCelsius(mm2));
        if (defaultInitial.isEmpty() && !b.has(m, "initial_c") && !b.has(m, "load")
                || defaultFinal.isEmpty() && !b.has(m, "final_c")) {
            b.problem(b.at(m, "method"), path + ".method", "ICEA P-32-382 temperatures are held for pvc, pvc-90,"
                    + " xlpe and epr only - give initial_c and final_c for " + ins.key());
            return Optional.empty();
        }
        Study.TemperatureSource initialSource;
        OptionalDouble initial;
        if (b.has(m, "load") && b.has(m, "initial_c")) {
            b.problem(b.value(m, "load"), path + ".load", "give either initial_c or load, not both");
            return Optional.empty();
        } else if (b.has(m, "load")) {
            initial = loadTemperature(m, path, defaultInitial.orElse(ins.maxOperatingCelsius()));
            initialSource = Study.TemperatureSource.FROM_LOAD;
        } else {
            initial = b.has(m, "initial_c") ? b.number(m, path, INITIAL) : defaultInitial;
            initialSource = b.has(m, "initial_c") ? Study.TemperatureSource.STATED
                    : Study.TemperatureSource.INSULATION_DEFAULT;
        }
        OptionalDouble fin = b.has(m, "final_c") ? b.number(m, path, FINAL) : defaultFinal;
        Study.TemperatureSource finalSource = b.has(m, "final_c") ? Study.TemperatureSource.STATED
                : Study.TemperatureSource.INSULATION_DEFAULT;
        if (initial.isEmpty() || fin.isEmpty() || parallel.isEmpty()) {
            return Optional.empty();
        }
        Optional<String> order = CableThermalLimit.temperatureProblem(initial.getAsDouble(), fin.getAsDouble());
        if (order.isPresent()) {
            String at = b.has(m, "initial_c") ? "initial_c" : "final_c";
            b.problem(b.has(m, at) ? b.value(m, at) : m, path + "." + at, order.get());
            return Optional.empty();
        }
        try {
            CableThermalLimit limit = new CableThermalLimit(id.get(), conductor.get(), ins, mm2, parallel.getAsInt(),
                    initial.getAsDouble(), fin.getAsDouble(), tm);
            network.cable(m, path, limit);
            return Optional.of(new Study.StudyCable(limit, sizeText,
                    fault.map(f -> new Study.CurrentRange(f[0], f[1])), initialSource, finalSource));
        } catch (IllegalArgumentException e) {
            b.problem(m, path, e.getMessage());
            return Optional.empty();
        }
    }

    private OptionalDouble loadTemperature(Node.MapNode m, String path, double maxOperatingCelsius) {
        String p = path + ".load";
        Optional<Node.MapNode> mapped = b.map(b.value(m, "load"), p);
        if (mapped.isEmpty()) {
            return OptionalDouble.empty();
        }
        Node.MapNode load = mapped.get();
        b.allowOnly(load, p, "current_a", "rated_a", "ambient_c");
        OptionalDouble current = b.number(load, p, LOAD_CURRENT);
        OptionalDouble rated = b.number(load, p, LOAD_RATED);
        OptionalDouble ambient = b.number(load, p, LOAD_AMBIENT);
        if (current.isEmpty() || rated.isEmpty() || ambient.isEmpty()) {
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(CableThermalLimit.initialFromLoad(ambient.getAsDouble(), maxOperatingCelsius,
                current.getAsDouble(), rated.getAsDouble()));
    }

    // --------------------------------------------------------------------------------------- devices

    private Optional<Study.StudyDevice> device(Node n, String path) {
        Optional<Node.MapNode> mapped = b.map(n, path);
        if (mapped.isEmpty()) {
            return Optional.empty();
        }
        Node.MapNode m = mapped.get();
        Optional<DeviceKind> type = b.choice(m, path, "type", TYPES);
        Optional<String> id = b.id(m, path, "every device needs an id");
        if (type.isEmpty()) {
            return Optional.empty();
        }
        OptionalDouble kv = studyKv.isPresent() ? b.number(m, path, VOLTAGE.orElse(studyKv.getAsDouble()))
                : b.number(m, path, VOLTAGE);
        int before = b.problemCount();
        Optional<ProtectiveDevice> device;
        String who = id.orElse(null);
        List<Note> notes = new ArrayList<>();
        designLimits = Study.DesignLimits.NONE;
        try {
            device = switch (type.get()) {
                case RELAY -> relay(m, path, who, notes);
                case FUSE -> fuse(m, path, who, notes);
                case BREAKER -> breaker(m, path, who, notes);
                case MCB -> mcb(m, path, who, notes);
            };
        } catch (IllegalArgumentException e) {
            // a combination of settings the model refuses, each valid on its own
            b.problem(m, path, e.getMessage());
            return Optional.empty();
        }
        if (device.isEmpty() || id.isEmpty() || kv.isEmpty() || b.problemCount() > before) {
            return Optional.empty();
        }
        network.device(m, path, id.get());
        double factor = studyKv.isEmpty() ? 1.0 : kv.getAsDouble() / studyKv.getAsDouble();
        return Optional.of(new Study.StudyDevice(device.get(), kv.getAsDouble(), factor,
                device.get().referredBy(factor), notes, designLimits));
    }

    private Optional<ProtectiveDevice> relay(Node.MapNode m, String path, String id, List<Note> notes) {
        b.allowOnly(m, path, "id", "type", "voltage_kv", "breaker_s", "ct", "stages", "tolerance", "load_a", "no_trip",
                "sensitivity_factor", "branch", "end");
        int before = b.problemCount();
        OptionalDouble breaker = b.number(m, path, BREAKER_TIME);
        Optional<CurrentTransformer> ct = Optional.empty();
        if (b.has(m, "ct")) {
            String p = path + ".ct";
            Optional<Node.MapNode> ctMap = b.map(b.value(m, "ct"), p);
            if (ctMap.isPresent()) {
                b.allowOnly(ctMap.get(), p, "primary_a", "secondary_a");
                OptionalDouble pri = b.number(ctMap.get(), p, CT_PRIMARY);
                OptionalDouble sec = b.number(ctMap.get(), p, CT_SECONDARY);
                if (pri.isPresent() && sec.isPresent()) {
                    ct = Optional.of(new CurrentTransformer(pri.getAsDouble(), sec.getAsDouble()));
                }
            }
        }
        if (!b.has(m, "stages")) {
            b.missing(m, path, "stages", "a relay needs at least one stage");
            return Optional.empty();
        }
        Optional<List<Node>> stageNodes = b.list(b.value(m, "stages"), path + ".stages");
        if (stageNodes.isEmpty()) {
            return Optional.empty();
        }
        if (stageNodes.get().isEmpty()) {
            b.problem(b.value(m, "stages"), path + ".stages", "found no stages - a relay needs at least one");
            return Optional.empty();
        }
        if (stageNodes.get().size() > MAX_STAGES) {
            b.problem(b.value(m, "stages"), path + ".stages", "found " + stageNodes.get().size()
                    + " stages - at most " + MAX_STAGES + " are accepted");
            return Optional.empty();
        }
        List<TimeCurrentCurve> stages = new ArrayList<>();
        for (int i = 0; i < stageNodes.get().size(); i++) {
            stage(stageNodes.get().get(i), path + ".stages[" + i + "]").ifPresent(stages::add);
        }
        RelayTolerance tolerance = RelayTolerance.NONE;
        if (b.has(m, "tolerance")) {
            tolerance = relayTolerance(m, path).orElse(RelayTolerance.NONE);
        }
        if (b.problemCount() > before || stages.size() != stageNodes.get().size() || id == null) {
            return Optional.empty();
        }
        String who = "relay '" + id + "'";
        if (!b.has(m, "tolerance")) {
            notes.add(new Note("relay-tolerance-not-stated", who + ": tolerance not stated, so both edges are the"
                    + " nominal curve; an interval must then contain the relay's error allowance"));
        }
        for (TimeCurrentCurve st : stages) {
            if (st instanceof DefiniteTimeStage dt && dt.timeAssumed()) {
                notes.add(new Note("instantaneous-time-assumed", who + ": instantaneous operating time not stated;"
                        + " 20 ms to 40 ms assumed (common practice), the slow edge for cable checks"));
                break;
            }
        }
        for (TimeCurrentCurve st : stages) {
            if (st instanceof InverseTimeStage inv && inv.highCurrent() == HighCurrentBehaviour.BAND) {
                notes.add(new Note("high-current-band", who + ": above " + Checks.format(inv.upperMultiple())
                        + " x pickup the " + inv.label() + " stage is a band between following its equation and"
                        + " holding (high_current not stated)"));
                break;
            }
        }
        Relay relay = new Relay(id, stages, ct, breaker.getAsDouble(), tolerance);
        Optional<Study.DesignLimits> limits = designLimits(m, path, stageNodes.get(), ct.isPresent());
        if (limits.isEmpty()) {
            return Optional.empty();
        }
        designLimits = limits.get();
        return Optional.of(relay);
    }

    /** What a relay's settings must respect beside the cable: its load, starting currents, sensitivity, steps. */
    private Optional<Study.DesignLimits> designLimits(Node.MapNode m, String path, List<Node> stageNodes,
            boolean secondary) {
        int before = b.problemCount();
        OptionalDouble load = b.number(m, path, LOAD);
        OptionalDouble sensitivity = b.number(m, path, SENSITIVITY);
        List<NoTrip> noTrip = new ArrayList<>();
        List<Node> points = b.optionalList(m, path, "no_trip");
        for (int i = 0; i < points.size(); i++) {
            Node item = points.get(i);
            String p = path + ".no_trip[" + i + "]";
            Optional<Node.MapNode> point = b.map(item, p);
            if (point.isEmpty()) {
                continue;
            }
            b.allowOnly(point.get(), p, "current_a", "time_s");
            OptionalDouble amps = b.number(point.get(), p, NO_TRIP_CURRENT);
            OptionalDouble seconds = b.number(point.get(), p, NO_TRIP_TIME);
            if (amps.isPresent() && seconds.isPresent()) {
                noTrip.add(new NoTrip(amps.getAsDouble(), seconds.getAsDouble()));
            }
        }
        double step = secondary ? Study.DesignLimits.DEFAULT_SECONDARY_PICKUP_STEP_A
                : Study.DesignLimits.DEFAULT_PICKUP_STEP_A;
        for (int i = 0; i < stageNodes.size(); i++) {
            if (stageNodes.get(i) instanceof Node.MapNode stage && b.has(stage, "pickup_step_a")) {
                step = b.number(stage, path + ".stages[" + i + "]", PICKUP_STEP).orElse(step);
                break;
            }
        }
        if (b.problemCount() > before) {
            return Optional.empty();
        }
        return Optional.of(new Study.DesignLimits(load, noTrip, sensitivity.getAsDouble(), step));
    }

    private Optional<RelayTolerance> relayTolerance(Node.MapNode m, String path) {
        String p = path + ".tolerance";
        Optional<Node.MapNode> t = b.map(b.value(m, "tolerance"), p);
        if (t.isEmpty()) {
            return Optional.empty();
        }
        b.allowOnly(t.get(), p, "time_percent", "time_min_s", "pickup_percent");
        OptionalDouble time = b.number(t.get(), p, TOL_TIME);
        OptionalDouble min = b.number(t.get(), p, TOL_TIME_MIN);
        OptionalDouble pickup = b.number(t.get(), p, TOL_PICKUP);
        if (time.isEmpty() || min.isEmpty() || pickup.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new RelayTolerance(time.getAsDouble() / 100, min.getAsDouble(), pickup.getAsDouble() / 100));
    }

    private Optional<TimeCurrentCurve> stage(Node n, String path) {
        Optional<Node.MapNode> mapped = b.map(n, path);
        if (mapped.isEmpty()) {
            return Optional.empty();
        }
        Node.MapNode m = mapped.get();
        Optional<String> curve = b.choice(m, path, "curve", CURVES);
        if (curve.isEmpty()) {
            return Optional.empty();
        }
        OptionalDouble pickup = b.number(m, path, PICKUP);
        switch (curve.get()) {
            case DEFINITE_TIME -> {
                b.allowOnly(m, path, "curve", "pickup_a", "delay_s");
                OptionalDouble delay = b.number(m, path, DT_DELAY);
                if (pickup.isEmpty() || delay.isEmpty()) {
                    return Optional.empty();
                }
                return Optional.of(DefiniteTimeStage.definiteTime(pickup.getAsDouble(), delay.getAsDouble()));
            }
            case INSTANTANEOUS -> {
                b.allowOnly(m, path, "curve", "pickup_a", "delay_s");
                OptionalDouble delay = b.number(m, path, INST_DELAY);
                if (pickup.isEmpty() || b.has(m, INST_DELAY.key()) && delay.isEmpty()) {
                    return Optional.empty();
                }
                return Optional.of(delay.isPresent()
                        ? DefiniteTimeStage.instantaneous(pickup.getAsDouble(), delay.getAsDouble())
                        : DefiniteTimeStage.instantaneousTimeAssumed(pickup.getAsDouble()));
            }
            default -> {
                return inverse(m, path, curve.get(), pickup);
            }
        }
    }

    private Optional<TimeCurrentCurve> inverse(Node.MapNode m, String path, String curve, OptionalDouble pickup) {
        boolean custom = curve.equals(CUSTOM);
        InverseTimeFamily family = custom ? null : InverseTimeFamily.byKey(curve);
        List<String> allowed = new ArrayList<>(List.of("curve", "pickup_a", "high_current", "upper_multiple"));
        MultiplierKind kind;
        if (custom) {
            allowed.addAll(List.of("a_s", "b_s", "p", "reset_s"));
            kind = b.has(m, MultiplierKind.TIME_DIAL.key()) ? MultiplierKind.TIME_DIAL : MultiplierKind.TMS;
            for (MultiplierKind k : MultiplierKind.values()) {
                allowed.add(k.key());
            }
            if (b.has(m, MultiplierKind.TIME_DIAL.key()) && b.has(m, MultiplierKind.TMS.key())) {
                b.problem(b.value(m, "time_dial"), path + ".time_dial", "give either tms or time_dial, not both");
            }
        } else {
            kind = family.multiplierKind();
            allowed.add(kind.key());
            for (MultiplierKind other : MultiplierKind.values()) {
                if (other != kind && b.has(m, other.key())) {
                    b.problemAtKey(m.entries().get(other.key()), path + "." + other.key(), curve + " is set by "
                            + kind.key() + ", not " + other.key());
                    allowed.add(other.key());
                }
            }
        }
        allowed.add(kind.rangeKey());
        allowed.add(kind.stepKey());
        allowed.add("pickup_step_a");
        b.allowOnly(m, path, allowed);
        int before = b.problemCount();
        OptionalDouble multiplier = b.number(m, path, MULTIPLIER_LIMITS.required().named(kind.key()));
        Optional<SettingRange> range = settingRange(m, path, kind, multiplier);
        Optional<HighCurrentBehaviour> hc = b.choice(m, path, "high_current", HIGH_CURRENT, HighCurrentBehaviour.BAND);
        OptionalDouble upper = b.number(m, path, UPPER_MULTIPLE);
        double a;
        double bb;
        double p;
        double reset;
        if (custom) {
            a = b.number(m, path, CONSTANT_A).orElse(1);
            bb = b.number(m, path, CONSTANT_B).orElse(0);
            p = b.number(m, path, EXPONENT).orElse(1);
            reset = b.number(m, path, RESET).orElse(Double.NaN);
        } else {
            a = family.aSeconds();
            bb = family.bSeconds();
            p = family.exponent();
            reset = family.resetSeconds();
        }
        if (b.problemCount() > before || pickup.isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(new InverseTimeStage(a, bb, p, reset, pickup.getAsDouble(), multiplier.getAsDouble(), kind,
                range.orElseThrow(), hc.orElseThrow(), upper.getAsDouble(), curve));
    }

    /** The stated setting range of a multiplier, or the kind's default widened to the setting. */
    private Optional<SettingRange> settingRange(Node.MapNode m, String path, MultiplierKind kind,
            OptionalDouble multiplier) {
        OptionalDouble step = b.number(m, path, MULTIPLIER_STEP.named(kind.stepKey())
                .orElse(kind.defaultRange().step()));
        if (step.isEmpty()) {
            return Optional.empty();
        }
        if (!b.has(m, kind.rangeKey())) {
            SettingRange d = kind.defaultRange();
            return multiplier.isPresent() ? Optional.of(new SettingRange(d.min(), d.max(), step.getAsDouble())
                    .including(multiplier.getAsDouble())) : Optional.empty();
        }
        Optional<double[]> pair = pair(m, path, kind.rangeKey(), MULTIPLIER_LIMITS);
        if (pair.isEmpty()) {
            return Optional.empty();
        }
        SettingRange r = new SettingRange(pair.get()[0], pair.get()[1], step.getAsDouble());
        if (multiplier.isPresent() && !r.contains(multiplier.getAsDouble())) {
            b.problem(b.value(m, kind.rangeKey()), Binder.join(path, kind.rangeKey()), "the " + kind.key() + " "
                    + Checks.format(multiplier.getAsDouble()) + " lies outside the stated range " + r
                    + " - widen the range or change the setting");
            return Optional.empty();
        }
        return Optional.of(r);
    }

    private Optional<ProtectiveDevice> fuse(Node.MapNode m, String path, String id, List<Note> notes) {
        b.allowOnly(m, path, "id", "type", "voltage_kv", "rating_a", "melting", "clearing", "clearing_i2t_a2s",
                "clearing_i2t", "pre_arcing_i2t_a2s", "pre_arcing_i2t", "category", "series", "branch", "end");
        int before = b.problemCount();
        OptionalDouble rating = b.number(m, path, FUSE_RATING);
        Optional<LetThroughEnergy> letThrough = energy(m, path, "clearing_i2t_a2s", "clearing_i2t");
        Optional<LetThroughEnergy> preArcing = energy(m, path, "pre_arcing_i2t_a2s", "pre_arcing_i2t");
        Optional<String> category = b.has(m, "category") ? b.choice(m, path, "category", FUSE_CATEGORIES)
                : Optional.empty();
        Optional<String> series = b.optionalText(m, path, "series");
        String who = "fuse '" + id + "'";
        Optional<TabulatedCurve> melting = tabulated(m, path, "melting", who + ": melting");
        Optional<TabulatedCurve> clearing = tabulated(m, path, "clearing", who + ": clearing");
        if (b.problemCount() > before || rating.isEmpty() || melting.isEmpty() || clearing.isEmpty() || id == null) {
            return Optional.empty();
        }
        letThrough.filter(LetThroughEnergy::isConstant).ifPresent(e -> notes.add(new Note("constant-let-through",
                who + ": one let-through energy (" + Checks.format(e.a2s(1)) + " A2s) assumed at every prospective"
                        + " current above its points; a maker's curve rises with the current")));
        try {
            return Optional.of(new Fuse(id, rating.getAsDouble(), melting.get(), clearing.get(), letThrough, preArcing,
                    category, series));
        } catch (IllegalArgumentException e) {
            b.problem(b.value(m, "clearing"), path + ".clearing", e.getMessage());
            return Optional.empty();
        }
    }

    /** An energy given as one value (key in A2s) or as points of prospective kA and A2s; empty if neither or invalid. */
    private Optional<LetThroughEnergy> energy(Node.MapNode m, String path, String constantKey, String pointsKey) {
        if (b.has(m, constantKey) && b.has(m, pointsKey)) {
            b.problem(b.value(m, pointsKey), path + "." + pointsKey, "give either " + constantKey + " or " + pointsKey
                    + ", not both");
            return Optional.empty();
        }
        if (b.has(m, constantKey)) {
            return optional(b.number(m, path, ENERGY_CONSTANT.named(constantKey))).map(LetThroughEnergy::constant);
        }
        if (!b.has(m, pointsKey)) {
            return Optional.empty();
        }
        Optional<double[][]> pts = b.points(m, path, pointsKey, MAX_POINTS, Binder.ENERGY_POINTS);
        if (pts.isEmpty()) {
            return Optional.empty();
        }
        double[] amps = pts.get()[0].clone();
        for (int i = 0; i < amps.length; i++) {
            amps[i] *= 1000;
        }
        Optional<String> bad = LetThroughEnergy.problem(amps, pts.get()[1]);
        if (bad.isPresent()) {
            b.problem(b.value(m, pointsKey), path + "." + pointsKey, bad.get());
            return Optional.empty();
        }
        return Optional.of(LetThroughEnergy.points(amps, pts.get()[1]));
    }

    private Optional<TabulatedCurve> tabulated(Node.MapNode m, String path, String key, String label) {
        Optional<double[][]> pts = b.points(m, path, key, MAX_POINTS);
        if (pts.isEmpty()) {
            return Optional.empty();
        }
        double[] amps = pts.get()[0];
        double[] seconds = pts.get()[1];
        int bad = TabulatedCurve.violation(amps, seconds);
        if (bad >= 0) {
            List<Node> items = ((Node.ListNode) b.value(m, key)).items();
            b.problem(items.get(bad), path + "." + key + "[" + bad + "]", TabulatedCurve.problem(label, amps, seconds));
            return Optional.empty();
        }
        return Optional.of(new TabulatedCurve(label, amps, seconds));
    }

    private Optional<ProtectiveDevice> breaker(Node.MapNode m, String path, String id, List<Note> notes) {
        b.allowOnly(m, path, "id", "type", "voltage_kv", "ir_a", "tr_s", "isd_a", "tsd_s", "tsd_i2t", "ii_a",
                "pickup_tolerance", "time_tolerance", "long_time_band", "instantaneous_s", "branch",
                "end");
        int before = b.problemCount();
        OptionalDouble ir = b.number(m, path, IR);
        OptionalDouble tr = b.number(m, path, TR);
        OptionalDouble isd = b.number(m, path, ISD);
        OptionalDouble tsd = b.number(m, path, b.has(m, ISD.key()) ? TSD.required() : TSD);
        Optional<Boolean> ramp = b.bool(m, path, "tsd_i2t", false);
        OptionalDouble ii = b.number(m, path, II);
        OptionalDouble pt = b.number(m, path, PICKUP_TOLERANCE);
        OptionalDouble tt = b.number(m, path, TIME_TOLERANCE);
        Optional<double[]> band = b.has(m, "long_time_band") ? pair(m, path, "long_time_band", PAIR_ITEM)
                : Optional.of(new double[] {1.05, 1.30});
        Optional<double[]> inst = b.has(m, "instantaneous_s") ? pair(m, path, "instantaneous_s", PAIR_ITEM)
                : Optional.of(new double[] {0.01, 0.05});
        if (b.problemCount() > before || id == null) {
            return Optional.empty();
        }
        String who = "breaker '" + id + "'";
        if (!b.has(m, PICKUP_TOLERANCE.key()) && (b.has(m, ISD.key()) || b.has(m, II.key()))) {
            notes.add(new Note("breaker-pickup-tolerance-assumed", who + ": Isd and Ii pickup tolerance not stated;"
                    + " +/-20 % assumed (IEC 60947-2)"));
        }
        if (!b.has(m, TIME_TOLERANCE.key())) {
            notes.add(new Note("breaker-time-tolerance-assumed", who + ": time tolerance not stated; +/-20 % assumed"));
        }
        if (!b.has(m, "instantaneous_s")) {
            notes.add(new Note("breaker-clearing-assumed", who + ": instantaneous clearing time not stated; 10 ms to"
                    + " 50 ms assumed"));
        }
        TripUnitBreaker.Settings s = new TripUnitBreaker.Settings(ir.getAsDouble(), tr.getAsDouble(),
                isd.getAsDouble(), tsd.getAsDouble(), ramp.orElseThrow(), ii.getAsDouble(), inst.get()[0],
                inst.get()[1], band.get()[0], band.get()[1], pt.getAsDouble(), tt.getAsDouble());
        return Optional.of(new TripUnitBreaker(id, s));
    }

    /** Two numbers [low, high] with low at most high. */
    private Optional<double[]> pair(Node.MapNode m, String path, String key, NumberField limits) {
        Optional<List<Node>> listed = b.list(b.at(m, key), path + "." + key);
        if (listed.isEmpty()) {
            return Optional.empty();
        }
        List<Node> items = listed.get();
        if (items.size() != 2) {
            b.problem(b.value(m, key), path + "." + key, "expected two numbers [low, high], found a list of "
                    + items.size());
            return Optional.empty();
        }
        OptionalDouble lo = b.number(items.get(0), path + "." + key + "[0]", limits.item());
        OptionalDouble hi = b.number(items.get(1), path + "." + key + "[1]", limits.item());
        if (lo.isEmpty() || hi.isEmpty()) {
            return Optional.empty();
        }
        if (hi.getAsDouble() < lo.getAsDouble()) {
            b.problem(items.get(1), path + "." + key + "[1]", "found " + Checks.format(hi.getAsDouble())
                    + " - must be at or above the first value, " + Checks.format(lo.getAsDouble()));
            return Optional.empty();
        }
        return Optional.of(new double[] {lo.getAsDouble(), hi.getAsDouble()});
    }

    private Optional<ProtectiveDevice> mcb(Node.MapNode m, String path, String id, List<Note> notes) {
        b.allowOnly(m, path, "id", "type", "voltage_kv", "curve_type", "rating_a", "fastest_s", "let_through_i2t_a2s",
                "let_through_i2t", "branch", "end");
        int before = b.problemCount();
        Optional<McbType> t = b.choice(m, path, "curve_type", MCB_TYPES);
        OptionalDouble rating = b.number(m, path, MCB_RATING);
        OptionalDouble fastest = b.number(m, path, MCB_FASTEST);
        Optional<LetThroughEnergy> letThrough = energy(m, path, "let_through_i2t_a2s", "let_through_i2t");
        if (b.problemCount() > before || id == null) {
            return Optional.empty();
        }
        String who = "mcb '" + id + "'";
        letThrough.filter(LetThroughEnergy::isConstant).ifPresent(e -> notes.add(new Note("constant-let-through",
                who + ": one let-through energy (" + Checks.format(e.a2s(1)) + " A2s) assumed at every prospective"
                        + " current; a maker's curve rises with the current")));
        if (!b.has(m, MCB_FASTEST.key())) {
            notes.add(new Note("mcb-fastest-assumed", who + ": fastest clearing time not stated; 5 ms assumed"
                    + " (a quarter cycle at 50 Hz)"));
        }
        return Optional.of(new MiniatureBreaker(id, t.orElseThrow(), rating.getAsDouble(), fastest.getAsDouble(),
                letThrough));
    }

    // ---------------------------------------------------------------------------------------- checks

    private List<Study.StudyCheck> check(Node n, String path, Map<String, Study.StudyCable> cables,
            Map<String, Study.StudyDevice> devices) {
        Optional<Node.MapNode> mapped = b.map(n, path);
        if (mapped.isEmpty()) {
            return List.of();
        }
        Node.MapNode m = mapped.get();
        if (b.has(m, "cable") || b.has(m, "device")) {
            return cableCheck(m, path, cables, devices).map(List::of).orElse(List.of());
        }
        if (b.has(m, "upstream") || b.has(m, "downstream")) {
            return gradingCheck(m, path, devices);
        }
        b.problem(m, path, "a check names either cable and device (a cable check) or upstream and downstream"
                + " (a grading check)" + (network.present() ? ", or accept: {upstream, downstream, reason}" : ""));
        return List.of();
    }

    private Optional<Study.StudyCheck> cableCheck(Node.MapNode m, String path, Map<String, Study.StudyCable> cables,
            Map<String, Study.StudyDevice> devices) {
        b.allowOnly(m, path, "cable", "device", "margin_s", "margin_ratio", "range_ka", "dc_offset");
        int before = b.problemCount();
        Optional<String> cable = reference(m, path, "cable", cables.keySet(), "cable");
        Optional<String> device = reference(m, path, "device", devices.keySet(), "device");
        Optional<MarginRequirement> req;
        if (b.has(m, "margin_s") && b.has(m, "margin_ratio")) {
            b.problem(b.value(m, "margin_ratio"), path + ".margin_ratio", "give either margin_s or margin_ratio, not both");
            return Optional.empty();
        } else if (b.has(m, "margin_ratio")) {
            req = optional(b.number(m, path, MARGIN_RATIO)).map(MarginRequirement::ratio);
        } else {
            req = optional(b.number(m, path, MARGIN_SECONDS)).map(MarginRequirement::seconds);
        }
        Optional<double[]> range = b.rangeKa(m, path, "range_ka", false);
        Optional<DcOffset> dc = Optional.empty();
        Study.DcSource dcSource = Study.DcSource.ASSUMED_KAPPA;
        if (frequency.isEmpty()) {
            return Optional.empty();
        }
        if (!b.has(m, "dc_offset")) {
            dc = Optional.of(new DcOffset(DcOffset.ASSUMED_KAPPA, frequency.getAsDouble()));
        } else if (b.value(m, "dc_offset") instanceof Node.Scalar word && word.type() == Node.ScalarType.STRING) {
            if (!word.text().equals("none")) {
                b.problem(word, path + ".dc_offset", "found '" + Binder.echo(word.text()) + "' - write none, or"
                        + " {kappa: 1.8}, or {x_r: 10}");
                return Optional.empty();
            }
            dcSource = Study.DcSource.NONE;
        } else {
            String p = path + ".dc_offset";
            Optional<Node.MapNode> d = b.map(b.value(m, "dc_offset"), p);
            if (d.isEmpty()) {
                return Optional.empty();
            }
            b.allowOnly(d.get(), p, "kappa", "x_r");
            if (b.has(d.get(), "kappa") == b.has(d.get(), "x_r")) {
                b.problem(d.get(), p, "give kappa or x_r, one of them");
                return Optional.empty();
            }
            if (b.has(d.get(), "kappa")) {
                OptionalDouble kappa = b.number(d.get(), p, KAPPA);
                if (kappa.isEmpty()) {
                    return Optional.empty();
                }
                dc = Optional.of(new DcOffset(kappa.getAsDouble(), frequency.getAsDouble()));
                dcSource = Study.DcSource.STATED_KAPPA;
            } else {
                OptionalDouble xr = b.number(d.get(), p, X_OVER_R);
                if (xr.isEmpty()) {
                    return Optional.empty();
                }
                dc = Optional.of(DcOffset.fromXOverR(xr.getAsDouble(), frequency.getAsDouble()));
                dcSource = Study.DcSource.FROM_X_R;
            }
        }
        if (b.problemCount() > before || cable.isEmpty() || device.isEmpty() || req.isEmpty()) {
            return Optional.empty();
        }
        Optional<Study.CurrentRange> checked = range.map(r -> new Study.CurrentRange(r[0], r[1]));
        Study.CableCheckSpec derived = derivedCables.get(cable.get());
        if (derived != null && !b.has(m, "dc_offset")) {
            // the network gives κ at the cable's sending end
            dc = derived.dcOffset();
            dcSource = derived.dcSource();
        }
        if (checked.isEmpty()) {
            checked = cables.get(cable.get()).fault();
            if (checked.isEmpty()) {
                b.problem(m, path + ".range_ka", "missing - cable '" + cable.get()
                        + "' has no fault_ka, so the check needs its own range_ka");
                return Optional.empty();
            }
        }
        return Optional.of(new Study.CableCheckSpec(cable.get(), device.get(), req.get(), checked.get(), dc, dcSource));
    }

    private List<Study.StudyCheck> gradingCheck(Node.MapNode m, String path, Map<String, Study.StudyDevice> devices) {
        b.allowOnly(m, path, "upstream", "downstream", "interval_s", "interval_to", "rating_ratio", "no_overlap",
                "range_ka");
        if (b.has(m, "interval_to") && !b.has(m, "interval_s")) {
            b.problemAtKey(m.entries().get("interval_to"), path + ".interval_to", "goes with interval_s");
        }
        Optional<String> up = reference(m, path, "upstream", devices.keySet(), "device");
        Optional<String> down = reference(m, path, "downstream", devices.keySet(), "device");
        int given = (b.has(m, "interval_s") ? 1 : 0) + (b.has(m, "rating_ratio") ? 1 : 0)
                + (b.has(m, "no_overlap") ? 1 : 0);
        Optional<GradingRequirement> req = Optional.empty();
        if (given > 1) {
            b.problem(m, path, "give one of interval_s, rating_ratio or no_overlap, not several");
        } else if (b.has(m, "rating_ratio")) {
            req = optional(b.number(m, path, RATING_RATIO)).map(GradingRequirement::ratingRatio);
            if (req.isPresent() && up.isPresent() && down.isPresent()
                    && (!(devices.get(up.get()).device() instanceof Fuse)
                    || !(devices.get(down.get()).device() instanceof Fuse))) {
                b.problem(b.value(m, "rating_ratio"), path + ".rating_ratio",
                        "a rating ratio applies to two fuses - use interval_s or no_overlap for other devices");
                req = Optional.empty();
            }
        } else if (b.has(m, "no_overlap")) {
            Optional<Boolean> v = b.bool(m, path, "no_overlap", true);
            if (v.isPresent() && !v.get()) {
                b.problem(b.value(m, "no_overlap"), path + ".no_overlap", "found false - write no_overlap: true, "
                        + "or give interval_s instead");
            } else if (v.isPresent()) {
                req = Optional.of(GradingRequirement.noOverlap());
            }
        } else {
            Optional<Boolean> toClearing = b.choice(m, path, "interval_to", INTERVAL_TO, false);
            req = optional(b.number(m, path, INTERVAL)).flatMap(v -> toClearing.map(c -> c
                    ? GradingRequirement.intervalBetweenClearingTimes(v) : GradingRequirement.intervalSeconds(v)));
        }
        List<Study.GradingCheckSpec> derived = up.isPresent() && down.isPresent()
                ? derivedPairs.getOrDefault(new Derivation.Pair(up.get(), down.get()), List.of()) : List.of();
        // with a network that could not be built, a missing range is not a problem of its own
        Optional<double[]> range = b.rangeKa(m, path, "range_ka", derived.isEmpty() && !network.present());
        if (up.isPresent() && up.equals(down)) {
            b.problem(b.value(m, "downstream"), path + ".downstream", "the same device as upstream, '" + up.get() + "'");
            return List.of();
        }
        if (range.isEmpty() && derived.isEmpty() && network.present() && networkBuilt && up.isPresent()
                && down.isPresent() && !b.has(m, "range_ka")) {
            b.missing(m, path, "range_ka", "the network derives no pair '" + up.get() + "' over '" + down.get()
                    + "', so the check needs its own range");
        }
        if (up.isEmpty() || down.isEmpty() || req.isEmpty() || (range.isEmpty() && derived.isEmpty())) {
            return List.of();
        }
        if (range.isPresent()) {
            return List.of(new Study.GradingCheckSpec(up.get(), down.get(), req.get(),
                    new Study.CurrentRange(range.get()[0], range.get()[1])));
        }
        // the study's requirement over the ranges the network derives for the pair
        List<Study.StudyCheck> out = new ArrayList<>();
        for (Study.GradingCheckSpec g : derived) {
            out.add(new Study.GradingCheckSpec(g.upstream(), g.downstream(), req.get(), g.range(), false, g.faultCase(),
                    g.upstreamScale()));
        }
        return out;
    }

    private static Optional<Double> optional(OptionalDouble v) {
        return v.isPresent() ? Optional.of(v.getAsDouble()) : Optional.empty();
    }

    private Optional<String> reference(Node.MapNode m, String path, String key, Set<String> ids, String what) {
        Optional<String> v = b.text(m, path, key, "the id of a " + what);
        if (v.isEmpty()) {
            return Optional.empty();
        }
        if (!ids.contains(v.get()) && declared.contains(what + ":" + v.get())) {
            // declared but invalid: its own problems are reported where it is declared
            return Optional.empty();
        }
        if (!ids.contains(v.get())) {
            // suggest among every declared id, valid or not: the author's typo is in this reference
            List<String> known = declared.stream().filter(d -> d.startsWith(what + ":"))
                    .map(d -> d.substring(what.length() + 1)).sorted().toList();
            String hint = Binder.suggestion(v.get(), known);
            b.problem(b.value(m, key), Binder.join(path, key), "no " + what + " has the id '" + Binder.echo(v.get()) + "'"
                    + (hint != null ? " - did you mean '" + hint + "'?" : known.isEmpty() ? " - the study has none"
                    : " - known: " + Binder.nearest(v.get(), known)));
            return Optional.empty();
        }
        return v;
    }
}
