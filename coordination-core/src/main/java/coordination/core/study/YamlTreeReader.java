package coordination.core.study;

import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.dataformat.yaml.YAMLFactory;
import com.fasterxml.jackson.dataformat.yaml.YAMLParser;
import java.io.IOException;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Optional;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.yaml.snakeyaml.LoaderOptions;

/**
 * Reads YAML text into located {@link Node}s. Syntax, duplicate keys, anchors and aliases are
 * found here, before any binding, so that their locations are exact and a binding error cannot hide
 * them.
 */
final class YamlTreeReader {
    /** Deeper than any study needs (a study nests about six levels). */
    static final int MAX_DEPTH = 40;

    /** A backslash escape of a UTF-16 surrogate, which the parser turns into '?' without a word. */
    private static final Pattern SURROGATE_ESCAPE = Pattern.compile("\\\\(u[dD][89a-fA-F][0-9a-fA-F]{2}"
            + "|U0000[dD][89a-fA-F][0-9a-fA-F]{2})");
    /** Fully qualified Java class names in a parser message: the user's file has nothing to do with them. */
    private static final Pattern CLASS_NAME = Pattern.compile("\\b(?:[a-z][a-z0-9_]*\\.)+[A-Z][A-Za-z0-9_$]*:?\\s*");
    /** Where the parser's message names the setting behind a limit: of no use to the user. */
    private static final Pattern LIMIT_SOURCE = Pattern.compile(",? from `[^`]*`");
    private static final String YAML_TAG_PREFIX = "tag:yaml.org,2002:";

    private final String file;
    private final Problems problems;
    private YAMLParser parser;
    private int depth;

    YamlTreeReader(String file, Problems problems) {
        this.file = file;
        this.problems = problems;
    }

    private void problem(int line, int column, String path, String message) {
        problems.add(line, column, path, message);
    }

    /** Refused characters in the raw text, located before the parser stops at them without a place. */
    private boolean rawTextIsClean(String text) {
        Optional<TextRules.Refusal> r = TextRules.check(text, true);
        if (r.isPresent()) {
            int[] at = lineAndColumn(text, r.get().index());
            problem(at[0], at[1], "", "the file " + r.get().message());
            return false;
        }
        Matcher m = SURROGATE_ESCAPE.matcher(text);
        if (m.find()) {
            int[] at = lineAndColumn(text, m.start());
            problem(at[0], at[1], "", "the escape \\" + m.group(1) + " is half of a surrogate pair"
                    + " - write the character itself");
            return false;
        }
        return true;
    }

    private static int[] lineAndColumn(String text, int index) {
        int line = 1;
        int start = 0;
        for (int i = 0; i < index; i++) {
            if (text.charAt(i) == '\n') {
                line++;
                start = i + 1;
            }
        }
        return new int[] {line, index - start + 1};
    }

    private static YAMLFactory factory() {
        LoaderOptions options = new LoaderOptions();
        options.setNestingDepthLimit(MAX_DEPTH + 10);
        options.setMaxAliasesForCollections(10);
        options.setAllowDuplicateKeys(true);
        return YAMLFactory.builder()
                .loaderOptions(options)
                .streamReadConstraints(StreamReadConstraints.builder().maxNestingDepth(MAX_DEPTH + 10)
                        .maxStringLength(100_000).maxNumberLength(1000).build())
                .build();
    }

    private static final YAMLFactory FACTORY = factory();

    /**
     * Parses a document.
     *
     * @param text the file's text
     * @return the root node, or null if the document could not be parsed (problems then say why)
     */
    Node read(String text) {
        if (!rawTextIsClean(text)) {
            return null;
        }
        try (YAMLParser p = FACTORY.createParser(text)) {
            parser = p;
            JsonToken t = p.nextToken();
            if (t == null) {
                problem(1, 1, "", "the file is empty - a study needs at least format, title,"
                        + " voltage_kv, cables, devices and checks");
                return null;
            }
            Node root = node(t, "");
            if (root != null && p.nextToken() != null) {
                JsonLocation l = p.currentTokenLocation();
                problem(l.getLineNr(), l.getColumnNr(), "",
                        "more than one YAML document - a study file holds one");
            }
            return root;
        } catch (JsonProcessingException e) {
            JsonLocation l = e.getLocation() != null ? e.getLocation() : parser == null ? null : parser.currentLocation();
            int line = l == null ? 1 : Math.max(1, l.getLineNr());
            int col = l == null ? 1 : Math.max(1, l.getColumnNr());
            problem(line, col, "", "not valid YAML: " + oneLine(e.getOriginalMessage()));
            return null;
        } catch (DepthExceeded e) {
            return null;
        } catch (IOException | RuntimeException e) {
            JsonLocation l = parser == null ? null : parser.currentLocation();
            int line = l == null ? 1 : Math.max(1, l.getLineNr());
            int col = l == null ? 1 : Math.max(1, l.getColumnNr());
            problem(line, col, "", "not valid YAML: " + oneLine(String.valueOf(e.getMessage())));
            return null;
        }
    }

    static String oneLine(String message) {
        // SnakeYAML's messages hold the context, a source excerpt with a caret, and the problem on
        // separate lines: keep the context and the problem
        String m = message == null ? "" : message.strip();
        List<String> kept = new ArrayList<>();
        for (String line : m.split("\n")) {
            String t = line.strip();
            if (t.isEmpty() || line.startsWith(" ") || line.startsWith("\t") || t.startsWith("in 'reader'")
                    || t.startsWith("at [Source") || t.equals("^")) {
                continue;
            }
            kept.add(t.replaceAll("\\s*in 'reader', line \\d+, column \\d+:?", ""));
        }
        String joined = CLASS_NAME.matcher(LIMIT_SOURCE.matcher(String.join(": ", kept)).replaceAll("")).replaceAll("");
        if (joined.length() > 200) {
            joined = joined.substring(0, 200) + "...";
        }
        return joined.isEmpty() ? "unreadable" : joined;
    }

    private Node node(JsonToken t, String path) throws IOException {
        JsonLocation l = parser.currentTokenLocation();
        int line = l.getLineNr();
        int col = l.getColumnNr();
        if (parser.isCurrentAlias()) {
            problem(line, col, path, "YAML aliases (*" + parser.getText()
                    + ") are not allowed in a study file - write the value out");
            return null;
        }
        String anchor = parser.getObjectId();
        if (anchor != null) {
            problem(line, col, path, "YAML anchors (&" + anchor
                    + ") are not allowed in a study file - write each value out");
        }
        String tag = parser.getTypeId();
        if (tag != null) {
            problem(line, col, path, "YAML tags (" + (tag.startsWith(YAML_TAG_PREFIX) ? "!!"
                    + tag.substring(YAML_TAG_PREFIX.length()) : "!" + tag) + ") are not allowed in a study file"
                    + " - write the value plainly");
        }
        if (t.isScalarValue()) {
            TextRules.check(parser.getText(), false).ifPresent(r -> problem(line, col, path, r.message()));
        }
        switch (t) {
            case START_OBJECT:
                return map(line, col, path);
            case START_ARRAY:
                return list(line, col, path);
            case VALUE_NUMBER_INT:
            case VALUE_NUMBER_FLOAT:
                return new Node.Scalar(line, col, parser.getText(), Node.ScalarType.NUMBER, parser.getDoubleValue());
            case VALUE_TRUE:
            case VALUE_FALSE:
                return new Node.Scalar(line, col, parser.getText(), Node.ScalarType.BOOLEAN, Double.NaN);
            case VALUE_NULL:
                return new Node.Scalar(line, col, "", Node.ScalarType.NULL, Double.NaN);
            default:
                return new Node.Scalar(line, col, parser.getText(), Node.ScalarType.STRING, Double.NaN);
        }
    }

    private Node map(int line, int col, String path) throws IOException {
        if (++depth > MAX_DEPTH) {
            problem(line, col, path, "nested deeper than " + MAX_DEPTH + " levels");
            throw new DepthExceeded();
        }
        LinkedHashMap<String, Node.Entry> entries = new LinkedHashMap<>();
        JsonToken t;
        while ((t = parser.nextToken()) == JsonToken.FIELD_NAME) {
            String key = parser.currentName();
            JsonLocation kl = parser.currentTokenLocation();
            String childPath = path.isEmpty() ? key : path + "." + key;
            TextRules.check(key, false).ifPresent(r -> problem(kl.getLineNr(), kl.getColumnNr(), childPath,
                    "the key " + r.message()));
            Node value = node(parser.nextToken(), childPath);
            if (entries.containsKey(key)) {
                Node.Entry first = entries.get(key);
                problem(kl.getLineNr(), kl.getColumnNr(), childPath,
                        "duplicate key - already given at line " + first.line());
            } else {
                entries.put(key, new Node.Entry(key, kl.getLineNr(), kl.getColumnNr(), value));
            }
        }
        depth--;
        return new Node.MapNode(line, col, entries);
    }

    private Node list(int line, int col, String path) throws IOException {
        if (++depth > MAX_DEPTH) {
            problem(line, col, path, "nested deeper than " + MAX_DEPTH + " levels");
            throw new DepthExceeded();
        }
        List<Node> items = new ArrayList<>();
        JsonToken t;
        while ((t = parser.nextToken()) != JsonToken.END_ARRAY && t != null) {
            items.add(node(t, path + "[" + items.size() + "]"));
        }
        depth--;
        return new Node.ListNode(line, col, items);
    }

    /** Stops a too-deep document at the first level too many; its problem is already recorded. */
    private static final class DepthExceeded extends RuntimeException {
        private static final long serialVersionUID = 1L;

        DepthExceeded() {
            super("nested too deep", null, false, false);
        }
    }
}
