package coordination.plot.sheet;

import coordination.plot.chart.Fonts;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.util.Base64;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.TreeSet;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.fontbox.ttf.TTFParser;
import org.apache.fontbox.ttf.TTFSubsetter;
import org.apache.fontbox.ttf.TrueTypeFont;
import org.apache.pdfbox.io.RandomAccessReadBuffer;

/**
 * Embeds the sheet's faces in an SVG document as {@code @font-face} rules, each a subset holding
 * just the characters the document's text uses, so that a browser shows the text in the faces it
 * was measured in, and the text stays text.
 */
final class SvgFonts {
    private static final Pattern TEXT = Pattern.compile("<text[^>]*>([^<]*)</text>");
    private static final Pattern ENTITY = Pattern.compile("&(#x[0-9a-fA-F]+|#[0-9]+|amp|lt|gt|quot|apos);");

    private static final java.util.List<String> TABLES = java.util.List.of("head", "hhea", "maxp", "OS/2", "cmap",
            "hmtx", "loca", "glyf", "name", "post", "cvt ", "fpgm", "prep", "gasp");

    private SvgFonts() {
    }

    /**
     * Adds the font faces to a document.
     *
     * @param svg the document, with its {@code <svg ...>} element
     * @return the document with a {@code <style>} element first inside the root
     * @throws IOException if a face cannot be read or subset
     */
    static String embed(String svg) throws IOException {
        TreeSet<Integer> used = new TreeSet<>();
        Matcher m = TEXT.matcher(svg);
        while (m.find()) {
            unescape(m.group(1)).codePoints().forEach(used::add);
        }
        if (used.isEmpty()) {
            return svg;
        }
        StringBuilder style = new StringBuilder("<style>");
        face(style, Fonts.REGULAR_FILE, "normal", used);
        face(style, Fonts.BOLD_FILE, "bold", used);
        style.append("</style>");
        int root = svg.indexOf("<svg");
        int end = svg.indexOf('>', root) + 1;
        return svg.substring(0, end) + style + svg.substring(end);
    }

    /**
     * Subsets already made, by face and characters: sheets of one batch mostly use the same
     * characters, and parsing a face costs more than drawing a sheet. Bounded, least recently used.
     */
    private static final Map<String, String> SUBSETS = java.util.Collections.synchronizedMap(
            new LinkedHashMap<>(64, 0.75f, true) {
                private static final long serialVersionUID = 1L;

                @Override
                protected boolean removeEldestEntry(Map.Entry<String, String> eldest) {
                    return size() > 64;
                }
            });

    private static void face(StringBuilder style, String file, String weight, TreeSet<Integer> used)
            throws IOException {
        String key = file + ":" + used;
        String subset = SUBSETS.get(key);
        if (subset == null) {
            subset = subset(file, used);
            SUBSETS.put(key, subset);
        }
        style.append("@font-face{font-family:\"").append(coordination.plot.chart.Palette.FONT_FAMILY)
                .append("\";font-weight:").append(weight).append(";src:url(data:font/ttf;base64,")
                .append(subset).append(") format(\"truetype\");}");
    }

    private static String subset(String file, TreeSet<Integer> used) throws IOException {
        TrueTypeFont ttf = face(file);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        // a parsed face reads its glyphs from one stream as it goes: one subset at a time
        synchronized (ttf) {
            // the layout tables (GPOS, GSUB, kern) would keep the whole font's glyph numbers; Java 2D
            // measured the text without them, so the browser draws it without them too
            TTFSubsetter subset = new TTFSubsetter(ttf, TABLES);
            subset.addAll(used);
            subset.writeToStream(out);
        }
        return Base64.getEncoder().encodeToString(out.toByteArray());
    }

    /**
     * The two faces, by file, parsed once per process when the first SVG embeds them: parsing costs
     * ten times a subset's making, and a process draws all its sheets in the same two faces.
     */
    private static final Map<String, TrueTypeFont> FACES = new java.util.HashMap<>();

    /**
     * Parses both faces, if not yet done, so that the first sheet's embedding finds them ready.
     *
     * @throws IOException if a face cannot be read
     */
    static void prepare() throws IOException {
        face(Fonts.REGULAR_FILE);
        face(Fonts.BOLD_FILE);
    }

    private static TrueTypeFont face(String file) throws IOException {
        synchronized (FACES) {
            TrueTypeFont ttf = FACES.get(file);
            if (ttf == null) {
                try (InputStream in = Fonts.open(file)) {
                    ttf = new TTFParser().parse(new RandomAccessReadBuffer(in.readAllBytes()));
                }
                FACES.put(file, ttf);
            }
            return ttf;
        }
    }

    private static String unescape(String s) {
        Matcher m = ENTITY.matcher(s);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            String e = m.group(1);
            String r = switch (e) {
                case "amp" -> "&";
                case "lt" -> "<";
                case "gt" -> ">";
                case "quot" -> "\"";
                case "apos" -> "'";
                default -> new String(Character.toChars(e.startsWith("#x") ? Integer.parseInt(e.substring(2), 16)
                        : Integer.parseInt(e.substring(1))));
            };
            m.appendReplacement(out, Matcher.quoteReplacement(r));
        }
        m.appendTail(out);
        return out.toString();
    }
}
