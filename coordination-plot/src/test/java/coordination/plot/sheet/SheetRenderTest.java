package coordination.plot.sheet;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.closeTo;
import static org.hamcrest.Matchers.containsString;
import static org.hamcrest.Matchers.greaterThan;
import static org.hamcrest.Matchers.is;

import coordination.core.Quantities;
import coordination.core.curve.InverseTimeStage;
import coordination.core.curve.Relay;
import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.xml.parsers.DocumentBuilderFactory;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;
import org.w3c.dom.Document;

/** Renders every sample study and checks the files' structure and their determinism. */
class SheetRenderTest {
    static Stream<Path> samples() throws Exception {
        return Files.list(Path.of("../samples")).filter(p -> p.toString().endsWith(".yaml")).sorted()
                .toList().stream();
    }

    private static CoordinationSheet sheet(Path file) {
        Study s = StudyReader.read(file);
        return new CoordinationSheet(s, StudyReport.evaluate(s));
    }

    @ParameterizedTest
    @MethodSource("samples")
    void svgParsesAndHoldsTitleCautionAndVerdicts(Path file) throws Exception {
        Study s = StudyReader.read(file);
        byte[] svg = new CoordinationSheet(s, StudyReport.evaluate(s)).render(OutputFormat.SVG, 150);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        Document doc = f.newDocumentBuilder().parse(new ByteArrayInputStream(svg));
        assertThat(doc.getDocumentElement().getTagName(), is("svg"));
        String text = doc.getDocumentElement().getTextContent();
        assertThat(text, containsString(s.title()));
        assertThat(text, containsString("these results support engineering judgement and do not replace"));
        assertThat(text, containsString("Devices and settings"));
        assertThat(text, containsString("Checks"));
    }

    private static String svgText(Study s) throws Exception {
        byte[] svg = new CoordinationSheet(s, StudyReport.evaluate(s)).render(OutputFormat.SVG, 150);
        DocumentBuilderFactory f = DocumentBuilderFactory.newInstance();
        f.setFeature("http://apache.org/xml/features/nonvalidating/load-external-dtd", false);
        return f.newDocumentBuilder().parse(new ByteArrayInputStream(svg)).getDocumentElement().getTextContent();
    }

    /**
     * Inputs appear on the sheet as the study gives them, computed values to three figures: the
     * second wrong answer of issue 12 printed 42.66 °C as "40 °C" and 150 °C as "200 °C".
     */
    @ParameterizedTest
    @MethodSource("samples")
    void theSheetShowsEveryInputAsGiven(Path file) throws Exception {
        Study s = StudyReader.read(file);
        String text = svgText(s);
        for (Study.StudyCable c : s.cables()) {
            assertThat(text, containsString(c.sizeText()));
            assertThat(text, containsString(CoordinationSheet.initial(c) + " to "
                    + Quantities.asGiven(c.limit().finalCelsius()) + " °C"));
        }
        for (Study.StudyDevice d : s.devices()) {
            if (d.device() instanceof Relay r) {
                for (var stage : r.stages()) {
                    if (stage instanceof InverseTimeStage inv) {
                        assertThat(text, containsString("pickup " + Quantities.asGiven(inv.pickupAmps()) + " A, "
                                + inv.multiplierKind().key().replace('_', ' ') + " " + Quantities.asGiven(inv.multiplier())));
                    }
                }
            }
        }
        assertThat(text, containsString(CoordinationSheet.SCOPE));
    }

    /** Every assumption and warning of the report is on the sheet; a failing check says why. */
    @ParameterizedTest
    @MethodSource("samples")
    void theSheetPrintsWhatTheResultsRestOnAndWhyACheckFails(Path file) throws Exception {
        Study s = StudyReader.read(file);
        StudyReport r = StudyReport.evaluate(s);
        String text = svgText(s).replaceAll("\\s+", "");
        List<String> expected = new ArrayList<>();
        r.notes().forEach(n -> n.assumptions().forEach(a -> expected.add(a.message())));
        r.notes().forEach(n -> n.warnings().forEach(w -> expected.add(w.message())));
        r.warnings().forEach(w -> expected.add(w.message()));
        java.util.regex.Pattern subject = java.util.regex.Pattern.compile("^\\w+ '([^']+)': (.*)$");
        for (String m : expected) {
            // wrapped lines are separate text elements, so compare without white space; a note said of
            // several devices names them all before what it says
            java.util.regex.Matcher about = subject.matcher(m);
            if (about.matches()) {
                assertThat(text, containsString("'" + about.group(1) + "'"));
                assertThat(text, containsString(about.group(2).replaceAll("\\s+", "")));
            } else {
                assertThat(text, containsString(m.replaceAll("\\s+", "")));
            }
        }
        for (var o : r.results()) {
            if (!o.pass()) {
                assertThat(text, containsString(("why: " + o.reason()).replaceAll("\\s+", "")));
            }
        }
    }

    /** The PDF's text is text: every device id, every verdict and the caution can be found in it. */
    @ParameterizedTest
    @MethodSource("samples")
    void pdfTextHoldsDevicesVerdictsAndCaution(Path file) throws Exception {
        Study s = StudyReader.read(file);
        StudyReport r = StudyReport.evaluate(s);
        byte[] pdf = new CoordinationSheet(s, r).render(OutputFormat.PDF, 150);
        String text;
        try (org.apache.pdfbox.pdmodel.PDDocument doc = org.apache.pdfbox.Loader.loadPDF(pdf)) {
            text = new org.apache.pdfbox.text.PDFTextStripper().getText(doc).replaceAll("\\s+", " ");
            assertThat(doc.getDocumentInformation().getTitle(), is(s.title()));
        }
        for (Study.StudyDevice d : s.devices()) {
            assertThat(text, containsString(d.id()));
        }
        for (var o : r.results()) {
            assertThat(text, containsString(o.pass() ? "pass" : "FAIL"));
        }
        assertThat(text, containsString(CoordinationSheet.CAUTION.substring(0, 60)));
        assertThat(text, containsString("Current at"));
    }

    /** The SVG scales (viewBox) and its tick labels are text elements. */
    @ParameterizedTest
    @MethodSource("samples")
    void svgScalesAndKeepsItsTickLabelsAsText(Path file) throws Exception {
        Study s = StudyReader.read(file);
        CoordinationSheet sheet = new CoordinationSheet(s, StudyReport.evaluate(s));
        String svg = new String(sheet.render(OutputFormat.SVG, 150), java.nio.charset.StandardCharsets.UTF_8);
        assertThat(svg, containsString("viewBox=\"0 0 " + (long) sheet.widthPoints() + " " + (long) sheet.heightPoints()
                + "\""));
        // printed at its size: the page is given in points
        assertThat(svg, containsString("width=\"" + (long) sheet.widthPoints() + "pt\""));
        assertThat(svg, containsString(">1 kA</text>"));
        assertThat(svg, containsString(">Time (s)</text>"));
        assertThat(svg, containsString("@font-face"));
    }

    @org.junit.jupiter.api.Test
    void theTitleBlockCarriesTheSignOff() throws Exception {
        String text = svgText(StudyReader.read(Path.of("../samples/01-main-switchboard-incomer.yaml")));
        assertThat(text, containsString("RW-E-0101"));
        assertThat(text, containsString("A. N. Engineer"));
        assertThat(text, containsString("approved"));
    }

    @org.junit.jupiter.api.Test
    void temperaturesAreNotRoundedToOneFigure() throws Exception {
        Study s = StudyReader.read(Path.of("../samples/03-dosing-room-mcbs.yaml"));
        // common practice: from the load, 30 + (70 - 30) x (18 / 32)^2 = 42.66 °C for the D2 cable
        assertThat(s.cable("D2-cable").limit().initialCelsius(), closeTo(42.656, 1e-3));
        assertThat(svgText(s), containsString("42.7 °C (from the load) to 160 °C (default)"));
        String stated = Files.readString(Path.of("../samples/02-filter-house-fuse.yaml")).replace("size_mm2: 120",
                "size_mm2: 120\n    initial_c: 84.9\n    final_c: 150");
        String text = svgText(StudyReader.parse("f.yaml", "f", stated));
        assertThat(text, containsString("84.9 °C to 150 °C"));
    }

    @ParameterizedTest
    @MethodSource("samples")
    void pngDecodesAtThePageSizeAndResolution(Path file) throws Exception {
        CoordinationSheet sheet = sheet(file);
        BufferedImage img = ImageIO.read(new ByteArrayInputStream(sheet.render(OutputFormat.PNG, 150)));
        assertThat(img.getWidth(), is((int) Math.round(sheet.widthPoints() * 150 / 72)));
        assertThat(img.getHeight(), is((int) Math.round(sheet.heightPoints() * 150 / 72)));
        BufferedImage hi = ImageIO.read(new ByteArrayInputStream(sheet.render(OutputFormat.PNG, 300)));
        assertThat(hi.getWidth(), is((int) Math.round(sheet.widthPoints() * 300 / 72)));
    }

    @ParameterizedTest
    @MethodSource("samples")
    void everyFormatIsByteIdenticalAcrossRuns(Path file) throws Exception {
        for (OutputFormat f : OutputFormat.values()) {
            byte[] a = sheet(file).render(f, 150);
            byte[] b = sheet(file).render(f, 150);
            assertThat(f + " of " + file, Arrays.equals(a, b), is(true));
            assertThat(a.length, greaterThan(1000));
        }
        // one sheet rendered to every format in turn gives the same bytes as fresh sheets
        CoordinationSheet reused = sheet(file);
        for (OutputFormat f : OutputFormat.values()) {
            assertThat(f + " reused", Arrays.equals(reused.render(f, 150), sheet(file).render(f, 150)), is(true));
        }
        byte[] pdf = sheet(file).render(OutputFormat.PDF, 150);
        assertThat(new String(pdf, 0, 5, java.nio.charset.StandardCharsets.US_ASCII), is("%PDF-"));
    }

    /**
     * A classic cross-reference table (ISO 32000-1, 7.5.4) whose trailer states one object more than the
     * highest object number (7.5.5); PDFBox 3.0's compressed cross-reference stream misstated it.
     */
    @ParameterizedTest
    @MethodSource("samples")
    void pdfTrailerCountsItsObjects(Path file) throws Exception {
        String pdf = new String(sheet(file).render(OutputFormat.PDF, 150), java.nio.charset.StandardCharsets.ISO_8859_1);
        java.util.regex.Matcher obj = java.util.regex.Pattern.compile("(?m)^(\\d+) 0 obj").matcher(pdf);
        int highest = 0;
        while (obj.find()) {
            highest = Math.max(highest, Integer.parseInt(obj.group(1)));
        }
        assertThat("no classic cross-reference table", pdf.contains("\nxref\n"), is(true));
        java.util.regex.Matcher size = java.util.regex.Pattern.compile("/Size (\\d+)").matcher(pdf);
        assertThat("no /Size in the trailer", size.find(), is(true));
        assertThat(Integer.parseInt(size.group(1)), is(highest + 1));
    }

    @ParameterizedTest
    @MethodSource("samples")
    void parallelRendersAreByteIdentical(Path file) throws Exception {
        byte[] reference = sheet(file).render(OutputFormat.PNG, 150);
        ExecutorService pool = Executors.newFixedThreadPool(4);
        try {
            List<Future<byte[]>> fs = new ArrayList<>();
            for (int i = 0; i < 4; i++) {
                fs.add(pool.submit(() -> sheet(file).render(OutputFormat.PNG, 150)));
            }
            for (Future<byte[]> f : fs) {
                assertThat("bytes of one render thread differ from the first render", Arrays.equals(reference, f.get()), is(true));
            }
        } finally {
            pool.shutdownNow();
        }
    }

    /** Preparing the formats on another thread, as a cold `sheet` does, changes no byte of a sheet. */
    @org.junit.jupiter.api.Test
    void preparingOnAnotherThreadChangesNoByte() throws Exception {
        CoordinationSheet sheet = sheet(Path.of("../samples/01-main-switchboard-incomer.yaml"));
        java.util.Map<OutputFormat, byte[]> before = new java.util.EnumMap<>(OutputFormat.class);
        for (OutputFormat f : OutputFormat.values()) {
            before.put(f, sheet.render(f, 150));
        }
        ExecutorService other = Executors.newSingleThreadExecutor();
        try {
            Future<?> prepared = other.submit(() -> {
                Drawing.prepare(java.util.EnumSet.allOf(OutputFormat.class));
                return null;
            });
            for (OutputFormat f : OutputFormat.values()) {
                assertThat(f + " bytes", Arrays.equals(sheet.render(f, 150), before.get(f)), is(true));
            }
            prepared.get();
        } finally {
            other.shutdownNow();
        }
    }
}
