package coordination.core.study;

import coordination.core.internal.Checks;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;
import java.util.OptionalInt;
import java.util.function.Function;

/**
 * Typed access to located nodes that records a {@link Problem} for every mistake instead of
 * stopping. Every reader returns an {@code Optional}: empty when the value is missing without a
 * default, or when it is invalid (a problem is then recorded). A caller that needs to know whether
 * anything went wrong compares {@link #problemCount()} before and after.
 */
final class Binder {
    /** Longest text value accepted: titles and ids are short. */
    static final int MAX_TEXT = 500;
    /** Longest id accepted: what a sheet's legend and tables can show in full. */
    static final int MAX_ID = 40;
    /** Longest words compared for a suggestion: the edit distance costs the product of the lengths. */
    private static final int MAX_SUGGESTED = 64;
    /** How many known ids a message lists. */
    private static final int KNOWN_SHOWN = 5;
    /**
     * A number as a person writes it in decimal. YAML 1.1 also reads 0250 as octal, 0x1F as hex,
     * 1_000 and 1:30 (base 60); none of those is accepted.
     */
    private static final java.util.regex.Pattern DECIMAL = java.util.regex.Pattern.compile(
            "[-+]?(0|[1-9][0-9]*)(\\.[0-9]*)?([eE][-+]?[0-9]+)?|[-+]?\\.[0-9]+([eE][-+]?[0-9]+)?");
    private static final java.util.regex.Pattern YAML_INFINITY_OR_NAN = java.util.regex.Pattern.compile(
            "[-+]?\\.(inf|Inf|INF)|\\.(nan|NaN|NAN)");

    private final Problems problems;

    Binder(Problems problems) {
        this.problems = problems;
    }

    /**
     * How a number is read: its key, unit and bounds, and whether it is required or defaulted.
     *
     * @param key the key in its mapping (empty for a list item)
     * @param unit the unit shown in messages, or empty
     * @param min lower bound
     * @param minExclusive whether the lower bound itself is refused
     * @param max upper bound, inclusive
     * @param mandatory whether a missing key is a problem
     * @param dflt the value of a missing optional key, or empty
     */
    record NumberField(String key, String unit, double min, boolean minExclusive, double max, boolean mandatory,
            OptionalDouble dflt) {

        static NumberField number(String key, String unit) {
            return new NumberField(key, unit, Double.NEGATIVE_INFINITY, false, Double.POSITIVE_INFINITY, false,
                    OptionalDouble.empty());
        }

        NumberField above(double bound) {
            return new NumberField(key, unit, bound, true, max, mandatory, dflt);
        }

        NumberField from(double bound) {
            return new NumberField(key, unit, bound, false, max, mandatory, dflt);
        }

        NumberField to(double bound) {
            return new NumberField(key, unit, min, minExclusive, bound, mandatory, dflt);
        }

        NumberField required() {
            return new NumberField(key, unit, min, minExclusive, max, true, dflt);
        }

        NumberField named(String newKey) {
            return new NumberField(newKey, unit, min, minExclusive, max, mandatory, dflt);
        }

        NumberField orElse(double value) {
            return new NumberField(key, unit, min, minExclusive, max, false, OptionalDouble.of(value));
        }

        /** The same bounds and unit for a value without a key (a list item). */
        NumberField item() {
            return new NumberField("", unit, min, minExclusive, max, true, OptionalDouble.empty());
        }
    }

    /**
     * The words of an enumeration, in declaration order, for a choice.
     *
     * @param values the constants
     * @param word the study-file word of each
     * @return words to constants
     */
    static <E> Map<String, E> words(E[] values, Function<E, String> word) {
        Map<String, E> m = new LinkedHashMap<>();
        for (E v : values) {
            m.put(word.apply(v), v);
        }
        return m;
    }

    int problemCount() {
        return problems.count();
    }

    void problem(Node at, String path, String message) {
        problems.add(at == null ? 1 : at.line(), at == null ? 1 : at.column(), path, message);
    }

    void problemAtKey(Node.Entry key, String path, String message) {
        problems.add(key.line(), key.column(), path, message);
    }

    static String join(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    Optional<Node.MapNode> map(Node n, String path) {
        if (n instanceof Node.MapNode m) {
            return Optional.of(m);
        }
        if (n != null) {
            problem(n, path, "expected a mapping of keys, found " + n.kindName());
        }
        return Optional.empty();
    }

    Optional<List<Node>> list(Node n, String path) {
        if (n instanceof Node.ListNode l) {
            return Optional.of(l.items());
        }
        if (n != null) {
            problem(n, path, "expected a list, found " + n.kindName());
        }
        return Optional.empty();
    }

    /** Reports every key of the map not in {@code allowed}, with a suggestion. */
    void allowOnly(Node.MapNode m, String path, List<String> allowed) {
        for (Node.Entry e : m.entries().values()) {
            if (!allowed.contains(e.name())) {
                String hint = suggestion(e.name(), allowed);
                problemAtKey(e, join(path, e.name()), "unknown key" + (hint == null ? " - allowed here: "
                        + String.join(", ", allowed) : " - did you mean '" + hint + "'?"));
            }
        }
    }

    void allowOnly(Node.MapNode m, String path, String... allowed) {
        allowOnly(m, path, Arrays.asList(allowed));
    }

    static String suggestion(String given, List<String> candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        int limit = Math.max(2, given.length() / 3);
        for (String c : candidates) {
            int d = closeness(given, c, limit);
            if (d < bestDistance) {
                bestDistance = d;
                best = c;
            }
        }
        return best != null && bestDistance <= limit ? best : null;
    }

    /**
     * How far a word is from a candidate: 0 for the same word in another case, 1 for a prefix
     * before an underscore, else the edit distance; beyond {@code limit}, or for words too long to
     * compare cheaply, {@code Integer.MAX_VALUE}.
     */
    static int closeness(String given, String c, int limit) {
        if (c.equalsIgnoreCase(given)) {
            return 0;
        }
        if (c.startsWith(given + "_") || given.startsWith(c + "_")) {
            return 1;
        }
        if (Math.abs(c.length() - given.length()) > limit || c.length() > MAX_SUGGESTED
                || given.length() > MAX_SUGGESTED) {
            return Integer.MAX_VALUE;
        }
        return distance(given, c);
    }

    /** Longest piece of a user's value echoed in a message. */
    private static final int ECHOED = 60;

    /** A value as a message echoes it: cut after {@link #ECHOED} characters. */
    static String echo(String value) {
        return value.length() <= ECHOED ? value : value.substring(0, ECHOED - 3) + "... (" + value.length()
                + " characters)";
    }

    /** The known words nearest to a given one, at most a few, with how many others there are. */
    static String nearest(String given, List<String> known) {
        List<String> sorted = new ArrayList<>(known);
        sorted.sort(java.util.Comparator.comparingInt((String k) -> closeness(given, k, Integer.MAX_VALUE - 1))
                .thenComparing(java.util.Comparator.naturalOrder()));
        List<String> shown = sorted.subList(0, Math.min(KNOWN_SHOWN, sorted.size()));
        return String.join(", ", shown) + (sorted.size() > shown.size() ? " and " + (sorted.size() - shown.size())
                + " more" : "");
    }

    private static int distance(String a, String b) {
        int[] prev = new int[b.length() + 1];
        int[] cur = new int[b.length() + 1];
        for (int j = 0; j <= b.length(); j++) {
            prev[j] = j;
        }
        for (int i = 1; i <= a.length(); i++) {
            cur[0] = i;
            for (int j = 1; j <= b.length(); j++) {
                int cost = a.charAt(i - 1) == b.charAt(j - 1) ? 0 : 1;
                cur[j] = Math.min(Math.min(cur[j - 1] + 1, prev[j] + 1), prev[j - 1] + cost);
            }
            int[] t = prev;
            prev = cur;
            cur = t;
        }
        return prev[b.length()];
    }

    boolean has(Node.MapNode m, String key) {
        return m.entries().containsKey(key);
    }

    Node value(Node.MapNode m, String key) {
        Node.Entry e = m.entries().get(key);
        return e == null ? null : e.value();
    }

    /** The value node of a key, or the mapping itself where the key has no value (for locations). */
    Node at(Node.MapNode m, String key) {
        Node n = value(m, key);
        return n == null ? m : n;
    }

    void missing(Node.MapNode m, String path, String key, String why) {
        problem(m, join(path, key), "missing" + (why.isEmpty() ? "" : " - " + why));
    }

    /** A required text value. */
    Optional<String> text(Node.MapNode m, String path, String key, String why) {
        if (!has(m, key)) {
            missing(m, path, key, why);
            return Optional.empty();
        }
        return optionalText(m, path, key);
    }

    /** A required id: text of at most {@link #MAX_ID} characters. */
    Optional<String> id(Node.MapNode m, String path, String why) {
        Optional<String> id = text(m, path, "id", why);
        if (id.isPresent() && id.get().length() > MAX_ID) {
            problem(value(m, "id"), join(path, "id"), "found an id of " + id.get().length() + " characters - ids are"
                    + " at most " + MAX_ID + ", so that sheets can show them whole");
            return Optional.empty();
        }
        return id;
    }

    /** An optional text value; empty if missing or invalid. */
    Optional<String> optionalText(Node.MapNode m, String path, String key) {
        if (!has(m, key)) {
            return Optional.empty();
        }
        Node n = value(m, key);
        if (n == null) {
            problem(m, join(path, key), "expected text, found nothing");
            return Optional.empty();
        }
        if (n instanceof Node.Scalar s && s.type() != Node.ScalarType.NULL) {
            if (s.text().isBlank()) {
                problem(n, join(path, key), "expected text, found an empty value");
                return Optional.empty();
            }
            if (s.text().length() > MAX_TEXT) {
                problem(n, join(path, key), "found text of " + s.text().length() + " characters - at most " + MAX_TEXT
                        + " are accepted");
                return Optional.empty();
            }
            return Optional.of(s.text());
        }
        problem(n, join(path, key), "expected text, found " + n.kindName());
        return Optional.empty();
    }

    /** A number of a mapping, as its field describes. */
    OptionalDouble number(Node.MapNode m, String path, NumberField f) {
        if (!has(m, f.key())) {
            if (f.mandatory()) {
                missing(m, path, f.key(), "");
            }
            return f.dflt();
        }
        return number(at(m, f.key()), join(path, f.key()), f);
    }

    /** A number at a node (a list item, or a key's value), with the field's bounds and unit. */
    OptionalDouble number(Node n, String path, NumberField f) {
        if (!(n instanceof Node.Scalar s) || s.type() != Node.ScalarType.NUMBER) {
            problem(n, path, "expected a number, found " + (n == null ? "nothing" : n.kindName()));
            return OptionalDouble.empty();
        }
        double v = s.number();
        String u = f.unit().isEmpty() ? "" : " " + f.unit();
        if (!Double.isFinite(v) || YAML_INFINITY_OR_NAN.matcher(s.text()).matches()) {
            problem(n, path, "expected a finite number, found " + s.text());
            return OptionalDouble.empty();
        }
        if (!isDecimal(s)) {
            problem(n, path, notDecimal(s));
            return OptionalDouble.empty();
        }
        boolean low = f.minExclusive() ? !(v > f.min()) : !(v >= f.min());
        if (low || v > f.max()) {
            String range = (f.minExclusive() ? "above " + fmt(f.min()) : "from " + fmt(f.min()))
                    + (Double.isInfinite(f.max()) ? "" : (f.minExclusive() ? " and at most " : " to ") + fmt(f.max()))
                    + u;
            problem(n, path, "found " + s.text() + u + " - must be " + range);
            return OptionalDouble.empty();
        }
        return OptionalDouble.of(v);
    }

    /** Whether a number scalar is written in plain decimal, as this reader reads it. */
    static boolean isDecimal(Node.Scalar s) {
        return DECIMAL.matcher(s.text()).matches();
    }

    static String notDecimal(Node.Scalar s) {
        return "found " + s.text() + " - write numbers in plain decimal, such as 250 or 0.25"
                + " (leading zeros, 0x, 0o, _ and : are refused: YAML would not read them as decimal)";
    }

    /** A whole number of a mapping, as its field describes (the field must have a default or be required). */
    OptionalInt integer(Node.MapNode m, String path, NumberField f) {
        boolean given = has(m, f.key());
        OptionalDouble v = number(m, path, f);
        if (v.isEmpty()) {
            return OptionalInt.empty();
        }
        if (given && v.getAsDouble() != Math.rint(v.getAsDouble())) {
            problem(value(m, f.key()), join(path, f.key()), "expected a whole number, found "
                    + ((Node.Scalar) value(m, f.key())).text());
            return OptionalInt.empty();
        }
        return OptionalInt.of((int) v.getAsDouble());
    }

    /** A boolean; empty if invalid. */
    Optional<Boolean> bool(Node.MapNode m, String path, String key, boolean dflt) {
        if (!has(m, key)) {
            return Optional.of(dflt);
        }
        Node n = value(m, key);
        if (n instanceof Node.Scalar s && s.type() == Node.ScalarType.BOOLEAN) {
            String word = s.text().toLowerCase(java.util.Locale.ROOT);
            if (word.equals("true") || word.equals("false")) {
                return Optional.of(word.equals("true"));
            }
            // YAML 1.1 also reads yes, no, on and off as booleans; a study says true or false
            problem(n, join(path, key), "found '" + s.text() + "' - write true or false");
            return Optional.empty();
        }
        problem(at(m, key), join(path, key), "expected true or false, found " + (n == null ? "nothing" : n.kindName()));
        return Optional.empty();
    }

    /** A required word of a set; empty if missing or invalid. */
    <E> Optional<E> choice(Node.MapNode m, String path, String key, Map<String, E> words) {
        if (!has(m, key)) {
            missing(m, path, key, "one of " + String.join(", ", words.keySet()));
            return Optional.empty();
        }
        return word(m, path, key, words);
    }

    /** An optional word of a set with a default; empty if invalid. */
    <E> Optional<E> choice(Node.MapNode m, String path, String key, Map<String, E> words, E dflt) {
        return has(m, key) ? word(m, path, key, words) : Optional.of(dflt);
    }

    private <E> Optional<E> word(Node.MapNode m, String path, String key, Map<String, E> words) {
        Optional<String> v = text(m, path, key, "");
        if (v.isEmpty()) {
            return Optional.empty();
        }
        E found = words.get(v.get());
        if (found == null) {
            List<String> allowed = new ArrayList<>(words.keySet());
            String hint = suggestion(v.get(), allowed);
            problem(value(m, key), join(path, key), "found '" + v.get() + "' - must be one of " + String.join(", ", allowed)
                    + (hint == null ? "" : " (did you mean '" + hint + "'?)"));
            return Optional.empty();
        }
        return Optional.of(found);
    }

    /** A {min, max} range in kA converted to amperes; empty if missing or invalid. */
    Optional<double[]> rangeKa(Node.MapNode m, String path, String key, boolean required) {
        if (!has(m, key)) {
            if (required) {
                missing(m, path, key, "a range such as {min: 1.5, max: 12}");
            }
            return Optional.empty();
        }
        String p = join(path, key);
        Node n = value(m, key);
        Optional<Node.MapNode> r = map(at(m, key), p);
        if (r.isEmpty()) {
            if (n == null) {
                problem(m, p, "expected a range such as {min: 1.5, max: 12}, found nothing");
            }
            return Optional.empty();
        }
        allowOnly(r.get(), p, "min", "max");
        OptionalDouble lo = number(r.get(), p, RANGE_MIN);
        OptionalDouble hi = number(r.get(), p, RANGE_MAX);
        if (lo.isEmpty() || hi.isEmpty()) {
            return Optional.empty();
        }
        if (hi.getAsDouble() < lo.getAsDouble()) {
            problem(value(r.get(), "max"), join(p, "max"), "found " + fmt(hi.getAsDouble()) + " kA - must be at or above"
                    + " min, " + fmt(lo.getAsDouble()) + " kA");
            return Optional.empty();
        }
        return Optional.of(new double[] {lo.getAsDouble() * 1000, hi.getAsDouble() * 1000});
    }

    private static final NumberField RANGE_MIN = NumberField.number("min", "kA").above(0).to(1e4).required();
    private static final NumberField RANGE_MAX = NumberField.number("max", "kA").above(0).to(1e4).required();
    /**
     * What the two numbers of a point are.
     *
     * @param words how a message names a point, e.g. {@code [current A, time s]}
     * @param x the first number
     * @param y the second number
     */
    record PointForm(String words, NumberField x, NumberField y) {
    }

    /** Points of a digitised time-current curve. */
    static final PointForm TIME_POINTS = new PointForm("[current A, time s]",
            NumberField.number("", "A").above(0).required(), NumberField.number("", "s").above(0).required());
    /** Points of an energy against prospective current. */
    static final PointForm ENERGY_POINTS = new PointForm("[prospective current kA, energy A2s]",
            NumberField.number("", "kA").above(0).to(1e4).required(),
            NumberField.number("", "A2s").above(0).to(1e12).required());

    /** A list of [current A, time s] pairs as {amps, seconds}; empty if missing or invalid. */
    Optional<double[][]> points(Node.MapNode m, String path, String key, int maxPoints) {
        return points(m, path, key, maxPoints, TIME_POINTS);
    }

    /** A list of pairs of a form, as {first numbers, second numbers}; empty if missing or invalid. */
    Optional<double[][]> points(Node.MapNode m, String path, String key, int maxPoints, PointForm form) {
        Node n = value(m, key);
        if (n == null) {
            missing(m, path, key, "a list of " + form.words() + " points");
            return Optional.empty();
        }
        String p = join(path, key);
        Optional<List<Node>> listed = list(n, p);
        if (listed.isEmpty()) {
            return Optional.empty();
        }
        List<Node> items = listed.get();
        if (items.size() < 2) {
            problem(n, p, "found " + items.size() + " point(s) - a curve needs at least 2");
            return Optional.empty();
        }
        if (items.size() > maxPoints) {
            problem(n, p, "found " + items.size() + " points - at most " + maxPoints + " are accepted");
            return Optional.empty();
        }
        double[] amps = new double[items.size()];
        double[] secs = new double[items.size()];
        int before = problemCount();
        for (int i = 0; i < items.size(); i++) {
            String ip = p + "[" + i + "]";
            List<Node> pair = items.get(i) instanceof Node.ListNode l ? l.items() : null;
            if (pair == null || pair.size() != 2) {
                problem(items.get(i), ip, "expected a point " + form.words() + ", found "
                        + (items.get(i) == null ? "nothing" : pair == null ? items.get(i).kindName()
                        : "a list of " + pair.size()));
                continue;
            }
            amps[i] = number(pair.get(0), ip + "[0]", form.x()).orElse(0);
            secs[i] = number(pair.get(1), ip + "[1]", form.y()).orElse(0);
        }
        return problemCount() > before ? Optional.empty() : Optional.of(new double[][] {amps, secs});
    }

    /** A list that may be missing or empty (a key with no value counts as empty). */
    List<Node> optionalList(Node.MapNode m, String path, String key) {
        Node n = value(m, key);
        return n == null ? new ArrayList<>() : list(n, join(path, key)).orElseGet(ArrayList::new);
    }

    static String fmt(double v) {
        return Checks.format(v);
    }
}
