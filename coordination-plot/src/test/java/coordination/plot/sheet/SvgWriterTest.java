package coordination.plot.sheet;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.is;
import static org.junit.jupiter.api.Assertions.assertThrows;

import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Random;
import java.util.stream.IntStream;
import java.util.stream.Stream;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.transform.OutputKeys;
import javax.xml.transform.Transformer;
import javax.xml.transform.TransformerFactory;
import javax.xml.transform.dom.DOMSource;
import javax.xml.transform.stream.StreamResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * The sheet's SVG writer against the reference it replaces, the platform's XML identity transform
 * (javax.xml.transform): the same characters for every sample sheet, the crowded layout sheet and
 * random text.
 */
class SvgWriterTest {
    private static final String SVG_NS = "http://www.w3.org/2000/svg";

    private static String reference(Element root) throws Exception {
        StringWriter out = new StringWriter();
        Transformer t = TransformerFactory.newInstance().newTransformer();
        t.setOutputProperty(OutputKeys.ENCODING, "UTF-8");
        t.transform(new DOMSource(root), new StreamResult(out));
        return out.toString();
    }

    static Stream<Path> sheets() throws Exception {
        return Stream.concat(Files.list(Path.of("../samples")).filter(p -> p.toString().endsWith(".yaml")).sorted(),
                Stream.of(Path.of("src/test/resources/layout/eight-devices-three-cables.yaml")));
    }

    @ParameterizedTest
    @MethodSource("sheets")
    void writesEverySheetAsThePlatformTransformDoes(Path file) throws Exception {
        Study s = StudyReader.read(file);
        CoordinationSheet sheet = new CoordinationSheet(s, StudyReport.evaluate(s));
        Element root = Drawing.svgTree(sheet.widthPoints(), sheet.heightPoints(), sheet::paint);
        same(SvgWriter.write(root), reference(root));
    }

    /** Equal, or the first difference with a little of its context, which a whole sheet would drown. */
    private static void same(String actual, String expected) {
        int i = 0;
        while (i < actual.length() && i < expected.length() && actual.charAt(i) == expected.charAt(i)) {
            i++;
        }
        int from = Math.max(0, i - 60);
        assertThat("at character " + i + ", after ..." + expected.substring(from, i),
                actual.substring(i, Math.min(actual.length(), i + 60)),
                is(expected.substring(i, Math.min(expected.length(), i + 60))));
    }

    /** Characters the escaping treats apart, with plain ones, in text and in attribute values. */
    private static final String POOL = "aZ09 .-_&<>\"'\n\t\r\u00b7\u00b0\u03ba\u2264\u2028\u2029\u007f\u0085\u009f\u00a0"
            + "\u0001\u001f\ud83d\ude00\u20ac";

    static IntStream seeds() {
        return IntStream.range(0, 200);
    }

    @ParameterizedTest
    @MethodSource("seeds")
    void escapesRandomTextAsThePlatformTransformDoes(int seed) throws Exception {
        Random r = new Random(0x5eed0000L + seed);
        Document doc = DocumentBuilderFactory.newDefaultInstance().newDocumentBuilder().getDOMImplementation()
                .createDocument(SVG_NS, "svg", null);
        Element root = doc.getDocumentElement();
        root.setAttribute("zone", random(r));
        root.setAttribute("width", random(r));
        Element text = doc.createElementNS(SVG_NS, "text");
        text.setAttribute("zeta", random(r));
        text.setAttribute("alpha", random(r));
        text.appendChild(doc.createTextNode(random(r)));
        root.appendChild(text);
        root.appendChild(doc.createElementNS(SVG_NS, "g"));
        same(SvgWriter.write(root), reference(root));
    }

    private static String random(Random r) {
        StringBuilder b = new StringBuilder();
        int n = r.nextInt(40);
        while (b.length() < n) {
            int i = r.nextInt(POOL.length());
            char c = POOL.charAt(i);
            if (Character.isHighSurrogate(c)) {
                b.append(c).append(POOL.charAt(i + 1));
            } else if (!Character.isLowSurrogate(c)) {
                b.append(c);
            }
        }
        return b.toString();
    }

    @Test
    void refusesANodeItDoesNotWrite() throws Exception {
        Document doc = DocumentBuilderFactory.newDefaultInstance().newDocumentBuilder().getDOMImplementation()
                .createDocument(SVG_NS, "svg", null);
        doc.getDocumentElement().appendChild(doc.createComment("a comment"));
        assertThrows(IllegalArgumentException.class, () -> SvgWriter.write(doc.getDocumentElement()));
    }
}
