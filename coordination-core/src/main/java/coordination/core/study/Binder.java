package coordination.core.study;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/** Typed access to located nodes that records a {@link Problem} for every mistake instead of stopping. */
final class Binder {
    /** Longest text value accepted: titles and ids are short. */
    static final int MAX_TEXT = 500;

    private final String file;
    private final List<Problem> problems;

    Binder(String file, List<Problem> problems) {
        this.file = file;
        this.problems = problems;
    }

    int problemCount() {
        return problems.size();
    }

    void problem(Node at, String path, String message) {
        problems.add(new Problem(file, at == null ? 1 : at.line(), at == null ? 1 : at.column(), path, message));
    }

    void problemAtKey(Node.Entry key, String path, String message) {
        problems.add(new Problem(file, key.line(), key.column(), path, message));
    }

    static String join(String path, String key) {
        return path.isEmpty() ? key : path + "." + key;
    }

    Node.MapNode map(Node n, String path) {
        if (n instanceof Node.MapNode m) {
            return m;
        }
        if (n != null) {
            problem(n, path, "expected a mapping of keys, found " + n.kindName());
        }
        return null;
    }

    List<Node> list(Node n, String path) {
        if (n instanceof Node.ListNode l) {
            return l.items();
        }
        if (n != null) {
            problem(n, path, "expected a list, found " + n.kindName());
        }
        return null;
    }

    /** Reports every key of the map not in {@code allowed}, with a suggestion. */
    void allowOnly(Node.MapNode m, String path, String... allowed) {
        for (Node.Entry e : m.entries().values()) {
            if (!Arrays.asList(allowed).contains(e.name())) {
                String hint = suggestion(e.name(), allowed);
                problemAtKey(e, join(path, e.name()), "unknown key" + (hint == null ? " - allowed here: "
                        + String.join(", ", allowed) : " - did you mean '" + hint + "'?"));
            }
        }
    }

    static String suggestion(String given, String... candidates) {
        String best = null;
        int bestDistance = Integer.MAX_VALUE;
        for (String c : candidates) {
            int d = c.equalsIgnoreCase(given) ? 0
                    : c.startsWith(given + "_") || given.startsWith(c + "_") ? 1 : distance(given, c);
            if (d < bestDistance) {
                bestDistance = d;
                best = c;
            }
        }
        return best != null && bestDistance <= Math.max(2, given.length() / 3) ? best : null;
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

    void missing(Node.MapNode m, String path, String key, String why) {
        problem(m, join(path, key), "missing" + (why.isEmpty() ? "" : " - " + why));
    }

    /** A required or optional text value; null if missing or invalid. */
    String text(Node.MapNode m, String path, String key, boolean required, String why) {
        Node n = value(m, key);
        if (n == null) {
            if (required && !has(m, key)) {
                missing(m, path, key, why);
            } else if (has(m, key)) {
                problem(m, join(path, key), "expected text, found nothing");
            }
            return null;
        }
        if (n instanceof Node.Scalar s && s.type() != Node.ScalarType.NULL) {
            if (s.text().isBlank()) {
                problem(n, join(path, key), "expected text, found an empty value");
                return null;
            }
            if (s.text().length() > MAX_TEXT) {
                problem(n, join(path, key), "found text of " + s.text().length() + " characters - at most " + MAX_TEXT
                        + " are accepted");
                return null;
            }
            return s.text();
        }
        problem(n, join(path, key), "expected text, found " + n.kindName());
        return null;
    }

    /**
     * A number; NaN if missing or invalid. {@code min} and {@code max} bound it, with
     * {@code minExclusive} making the lower bound strict.
     */
    double number(Node.MapNode m, String path, String key, boolean required, double dflt, double min,
            boolean minExclusive, double max, String unit) {
        Node n = value(m, key);
        if (n == null && !has(m, key)) {
            if (required) {
                missing(m, path, key, "");
                return Double.NaN;
            }
            return dflt;
        }
        return number(n == null ? m : n, join(path, key), min, minExclusive, max, unit);
    }

    double number(Node n, String path, double min, boolean minExclusive, double max, String unit) {
        if (!(n instanceof Node.Scalar s) || s.type() != Node.ScalarType.NUMBER) {
            problem(n, path, "expected a number, found " + (n == null ? "nothing" : n.kindName()));
            return Double.NaN;
        }
        double v = s.number();
        String u = unit.isEmpty() ? "" : " " + unit;
        if (!Double.isFinite(v)) {
            problem(n, path, "expected a finite number, found " + s.text());
            return Double.NaN;
        }
        boolean low = minExclusive ? !(v > min) : !(v >= min);
        if (low || v > max) {
            String range = (minExclusive ? "above " + fmt(min) : "from " + fmt(min))
                    + (Double.isInfinite(max) ? "" : (minExclusive ? " and at most " : " to ") + fmt(max)) + u;
            problem(n, path, "found " + s.text() + u + " - must be " + range);
            return Double.NaN;
        }
        return v;
    }

    int integer(Node.MapNode m, String path, String key, int dflt, int min, int max) {
        Node n = value(m, key);
        if (n == null && !has(m, key)) {
            return dflt;
        }
        double v = number(n == null ? m : n, join(path, key), min, false, max, "");
        if (Double.isNaN(v)) {
            return Integer.MIN_VALUE;
        }
        if (v != Math.rint(v)) {
            problem(n, join(path, key), "expected a whole number, found " + ((Node.Scalar) n).text());
            return Integer.MIN_VALUE;
        }
        return (int) v;
    }

    Boolean bool(Node.MapNode m, String path, String key, boolean dflt) {
        Node n = value(m, key);
        if (n == null && !has(m, key)) {
            return dflt;
        }
        if (n instanceof Node.Scalar s && s.type() == Node.ScalarType.BOOLEAN) {
            return Boolean.parseBoolean(s.text().toLowerCase(java.util.Locale.ROOT));
        }
        problem(n == null ? m : n, join(path, key), "expected true or false, found "
                + (n == null ? "nothing" : n.kindName()));
        return null;
    }

    /** One of a set of words; null if missing or invalid. */
    String choice(Node.MapNode m, String path, String key, boolean required, String dflt, List<String> allowed) {
        Node n = value(m, key);
        if (n == null && !has(m, key)) {
            if (required) {
                missing(m, path, key, "one of " + String.join(", ", allowed));
                return null;
            }
            return dflt;
        }
        String v = text(m, path, key, true, "");
        if (v == null) {
            return null;
        }
        if (!allowed.contains(v)) {
            String hint = suggestion(v, allowed.toArray(new String[0]));
            problem(n, join(path, key), "found '" + v + "' - must be one of " + String.join(", ", allowed)
                    + (hint == null ? "" : " (did you mean '" + hint + "'?)"));
            return null;
        }
        return v;
    }

    /** A {min, max} range in kA converted to amperes; null if invalid. */
    double[] rangeKa(Node.MapNode m, String path, String key, boolean required) {
        Node n = value(m, key);
        if (n == null && !has(m, key)) {
            if (required) {
                missing(m, path, key, "a range such as {min: 1.5, max: 12}");
            }
            return null;
        }
        String p = join(path, key);
        Node.MapNode r = map(n == null ? m : n, p);
        if (r == null) {
            if (n == null) {
                problem(m, p, "expected a range such as {min: 1.5, max: 12}, found nothing");
            }
            return null;
        }
        allowOnly(r, p, "min", "max");
        double lo = number(r, p, "min", true, Double.NaN, 0, true, 1e4, "kA");
        double hi = number(r, p, "max", true, Double.NaN, 0, true, 1e4, "kA");
        if (Double.isNaN(lo) || Double.isNaN(hi)) {
            return null;
        }
        if (hi < lo) {
            problem(value(r, "max"), join(p, "max"), "found " + fmt(hi) + " kA - must be at or above min, "
                    + fmt(lo) + " kA");
            return null;
        }
        return new double[] {lo * 1000, hi * 1000};
    }

    /** A list of [current A, time s] pairs; null if invalid. */
    double[][] points(Node.MapNode m, String path, String key, boolean required, int maxPoints) {
        Node n = value(m, key);
        if (n == null) {
            if (required) {
                missing(m, path, key, "a list of [current A, time s] points");
            }
            return null;
        }
        String p = join(path, key);
        List<Node> items = list(n, p);
        if (items == null) {
            return null;
        }
        if (items.size() < 2) {
            problem(n, p, "found " + items.size() + " point(s) - a curve needs at least 2");
            return null;
        }
        if (items.size() > maxPoints) {
            problem(n, p, "found " + items.size() + " points - at most " + maxPoints + " are accepted");
            return null;
        }
        double[] amps = new double[items.size()];
        double[] secs = new double[items.size()];
        boolean ok = true;
        for (int i = 0; i < items.size(); i++) {
            String ip = p + "[" + i + "]";
            List<Node> pair = items.get(i) instanceof Node.ListNode l ? l.items() : null;
            if (pair == null || pair.size() != 2) {
                problem(items.get(i), ip, "expected a point [current A, time s], found "
                        + (items.get(i) == null ? "nothing" : pair == null ? items.get(i).kindName()
                        : "a list of " + pair.size()));
                ok = false;
                continue;
            }
            amps[i] = number(pair.get(0), ip + "[0]", 0, true, Double.POSITIVE_INFINITY, "A");
            secs[i] = number(pair.get(1), ip + "[1]", 0, true, Double.POSITIVE_INFINITY, "s");
            ok &= !Double.isNaN(amps[i]) && !Double.isNaN(secs[i]);
        }
        return ok ? new double[][] {amps, secs} : null;
    }

    /** A list that may be missing or empty (a key with no value counts as empty). */
    List<Node> optionalList(Node.MapNode m, String path, String key) {
        Node n = value(m, key);
        List<Node> l = n == null ? null : list(n, join(path, key));
        return l == null ? new ArrayList<>() : l;
    }

    static String fmt(double v) {
        return coordination.core.internal.Checks.format(v);
    }
}
