package coordination.plot.sheet;

import com.pngencoder.PngEncoder;
import com.pngencoder.PngEncoderPhysicalPixelDimensions;
import coordination.plot.chart.Fonts;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2DFontTextDrawer;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.lang.ref.SoftReference;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.time.LocalDate;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.Locale;
import java.util.Optional;
import java.util.TimeZone;
import java.util.function.Consumer;
import javax.xml.parsers.DocumentBuilderFactory;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDDocumentInformation;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;
import org.apache.batik.svggen.SVGGeneratorContext;
import org.apache.batik.svggen.SVGGraphics2D;
import org.w3c.dom.DOMImplementation;
import org.w3c.dom.Document;
import org.w3c.dom.Element;

/**
 * Renders a painting, given in points (1/72 in), to SVG, PNG or PDF bytes. The output depends on
 * the painting alone: no clock, no random identifier. The PDF document ID, which PDFBox would
 * otherwise derive from the time, is an MD5 digest of the page's content.
 */
public final class Drawing {
    private static final int PNG_DEFLATE_LEVEL = 3;
    /** The PDF's creator: this tool, without a version, so that a rebuild gives the same bytes. */
    private static final String CREATOR = "coordination (open-source protection coordination tool)";

    private Drawing() {
    }

    /**
     * Renders a painting.
     *
     * @param format the file format
     * @param widthPt width in points
     * @param heightPt height in points
     * @param dpi resolution of PNG output in dots per inch (ignored for SVG and PDF)
     * @param painter draws on a Graphics2D whose unit is one point
     * @return the file's bytes
     * @throws IOException if the encoder fails
     */
    public static byte[] render(OutputFormat format, double widthPt, double heightPt, int dpi,
            Consumer<Graphics2D> painter) throws IOException {
        return render(format, widthPt, heightPt, dpi, painter, new Info("", "", Optional.empty()));
    }

    /**
     * What a document says about itself: the PDF's information dictionary. The date is the
     * study's, never the clock's, so that the bytes stay the same from run to run.
     *
     * @param title the document title
     * @param subject what it is
     * @param created the creation date, if the study gives one
     */
    public record Info(String title, String subject, Optional<LocalDate> created) {
    }

    /**
     * Renders a painting with a document title, subject and date.
     *
     * @param format the file format
     * @param widthPt width in points
     * @param heightPt height in points
     * @param dpi resolution of PNG output in dots per inch (ignored for SVG and PDF)
     * @param painter draws on a Graphics2D whose unit is one point
     * @param info what the PDF says about itself (SVG and PNG carry their text in the drawing)
     * @return the file's bytes
     * @throws IOException if the encoder fails
     */
    public static byte[] render(OutputFormat format, double widthPt, double heightPt, int dpi,
            Consumer<Graphics2D> painter, Info info) throws IOException {
        return switch (format) {
            case SVG -> svg(widthPt, heightPt, painter);
            case PNG -> png(widthPt, heightPt, dpi, painter);
            case PDF -> pdf(widthPt, heightPt, painter, info);
        };
    }

    /**
     * Does the first-use work of drawing in the given formats: loading the faces and the platform's
     * graphics, parsing the faces SVG embeds, and a first small drawing through each format's
     * writer. A cold process spends more time on that than on a sheet; a caller with a core to
     * spare can call this on another thread while it reads and checks its first study, and the
     * sheets it draws then are the same bytes as without.
     *
     * @param formats the formats to prepare
     * @throws IOException if a face cannot be read or a writer fails
     */
    public static void prepare(java.util.Set<OutputFormat> formats) throws IOException {
        if (formats.contains(OutputFormat.SVG)) {
            // the last thing a sheet needs and the longest to prepare: first, so that it is ready in time
            SvgFonts.prepare();
        }
        for (OutputFormat f : OutputFormat.values()) {
            if (formats.contains(f)) {
                render(f, 40, 20, 72, g -> {
                    g.draw(new java.awt.geom.Line2D.Double(1, 1, 30, 15));
                    g.setFont(Fonts.of(java.awt.Font.PLAIN, 7));
                    g.drawString("0.1 s", 2, 10);
                    g.setFont(Fonts.of(java.awt.Font.BOLD, 7));
                    g.drawString("1 kA", 2, 18);
                });
            }
        }
    }

    static void hints(Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
    }

    private static byte[] svg(double w, double h, Consumer<Graphics2D> painter) throws IOException {
        return SvgFonts.embed(SvgWriter.write(svgTree(w, h, painter))).getBytes(StandardCharsets.UTF_8);
    }

    /**
     * The SVG generator's element tree of a painting, before the faces are embedded.
     *
     * @param w width in points
     * @param h height in points
     * @param painter draws on a Graphics2D whose unit is one point
     * @return the root element
     */
    static Element svgTree(double w, double h, Consumer<Graphics2D> painter) {
        Document doc = Dom.IMPLEMENTATION.createDocument(SVG_NS, "svg", null);
        SVGGeneratorContext ctx = SVGGeneratorContext.createDefault(doc);
        ctx.setComment(null);
        // a hundredth of a point is far below what any viewer shows, and halves the document
        ctx.setPrecision(2);
        // text as text, in the faces SvgFonts embeds
        ctx.setEmbeddedFontsOn(false);
        // the page's own face as the document's default, rather than the platform's logical one, whose
        // family name would have the font manager look through every face installed on the machine
        SVGGeneratorContext.GraphicContextDefaults defaults = new SVGGeneratorContext.GraphicContextDefaults();
        defaults.setFont(Fonts.of(java.awt.Font.PLAIN, 12));
        ctx.setGraphicContextDefaults(defaults);
        SVGGraphics2D g = new SVGGraphics2D(ctx, false);
        hints(g);
        painter.accept(g);
        Element root = g.getRoot();
        // the page in points, so that it prints at its size; the viewBox maps one point to one user unit,
        // so that a browser scales the page to its window
        root.setAttribute("width", number(w) + "pt");
        root.setAttribute("height", number(h) + "pt");
        root.setAttribute("viewBox", "0 0 " + number(w) + " " + number(h));
        g.dispose();
        return root;
    }

    private static final String SVG_NS = "http://www.w3.org/2000/svg";

    /** The platform's DOM, found once, when the first SVG is drawn. */
    private static final class Dom {
        static final DOMImplementation IMPLEMENTATION;

        static {
            try {
                // the platform's own factory, without the service lookup through every jar on the class path
                IMPLEMENTATION = DocumentBuilderFactory.newDefaultInstance().newDocumentBuilder().getDOMImplementation();
            } catch (ParserConfigurationException e) {
                throw new IllegalStateException("the platform's XML parser cannot create a document", e);
            }
        }

        private Dom() {
        }
    }

    private static String number(double v) {
        double r = Math.round(v * 100) / 100.0;
        return r == Math.rint(r) ? Long.toString((long) r) : Double.toString(r);
    }

    private static byte[] png(double w, double h, int dpi, Consumer<Graphics2D> painter) throws IOException {
        double scale = dpi / 72.0;
        int pw = (int) Math.round(w * scale);
        int ph = (int) Math.round(h * scale);
        BufferedImage image = canvas(pw, ph);
        Graphics2D g = image.createGraphics();
        hints(g);
        g.setColor(java.awt.Color.WHITE);
        g.fillRect(0, 0, pw, ph);
        g.scale(scale, scale);
        painter.accept(g);
        g.dispose();
        return encodePng(image, dpi);
    }

    /**
     * One reusable canvas per thread: a sheet at 150 dpi is 9 MB, and batch runs draw thousands.
     * Held softly, so that the threads of a caller's pool do not pin it once memory is wanted
     * elsewhere.
     */
    private static final ThreadLocal<SoftReference<BufferedImage>> CANVAS = new ThreadLocal<>();

    private static BufferedImage canvas(int w, int h) {
        SoftReference<BufferedImage> held = CANVAS.get();
        BufferedImage b = held == null ? null : held.get();
        if (b == null || b.getWidth() != w || b.getHeight() != h) {
            b = new BufferedImage(w, h, BufferedImage.TYPE_3BYTE_BGR);
            CANVAS.set(new SoftReference<>(b));
        }
        return b;
    }

    private static byte[] encodePng(BufferedImage image, int dpi) {
        // deflate level 3 without predictors: a quarter of ImageIO's time for a few percent more bytes;
        // single-threaded so that the bytes never depend on scheduling
        return new PngEncoder().withBufferedImage(image).withCompressionLevel(PNG_DEFLATE_LEVEL)
                .withPredictorEncoding(false).withMultiThreadedCompressionEnabled(false)
                .withPhysicalPixelDimensions(PngEncoderPhysicalPixelDimensions.dotsPerInch(dpi)).toBytes();
    }

    private static byte[] pdf(double w, double h, Consumer<Graphics2D> painter, Info info) throws IOException {
        try (PDDocument doc = new PDDocument();
                PdfBoxGraphics2DFontTextDrawer fonts = new PdfBoxGraphics2DFontTextDrawer()) {
            PDDocumentInformation about = doc.getDocumentInformation();
            about.setTitle(info.title().isEmpty() ? null : info.title());
            about.setSubject(info.subject().isEmpty() ? null : info.subject());
            about.setCreator(CREATOR);
            info.created().ifPresent(d -> {
                Calendar c = new GregorianCalendar(TimeZone.getTimeZone("UTC"), Locale.ROOT);
                c.clear();
                c.set(d.getYear(), d.getMonthValue() - 1, d.getDayOfMonth());
                about.setCreationDate(c);
            });
            PDRectangle size = new PDRectangle((float) w, (float) h);
            PDPage page = new PDPage(size);
            doc.addPage(page);
            PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, size);
            // text as text: the shipped faces are embedded (as subsets), so that it can be selected and searched
            for (String file : new String[] {Fonts.REGULAR_FILE, Fonts.BOLD_FILE}) {
                try (java.io.InputStream in = Fonts.open(file)) {
                    fonts.registerFont(in);
                }
            }
            g.setFontTextDrawer(fonts);
            hints(g);
            painter.accept(g);
            g.dispose();
            PDFormXObject form = g.getXFormObject();
            try (PDPageContentStream cs = new PDPageContentStream(doc, page)) {
                cs.drawForm(form);
            }
            byte[] id = contentDigest(svg(w, h, painter));
            COSArray ids = new COSArray();
            ids.add(new COSString(id));
            ids.add(new COSString(id));
            doc.getDocument().getTrailer().setItem(COSName.ID, ids);
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            // a classic cross-reference table: the compressed one of PDFBox 3.0 misstates its object count (qpdf --check)
            doc.save(out, org.apache.pdfbox.pdfwriter.compress.CompressParameters.NO_COMPRESSION);
            return out.toByteArray();
        }
    }

    private static byte[] contentDigest(byte[] content) {
        try {
            return MessageDigest.getInstance("MD5").digest(content);
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("MD5 is required of every Java platform", e);
        }
    }
}
