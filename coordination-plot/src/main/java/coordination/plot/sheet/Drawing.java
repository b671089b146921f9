package coordination.plot.sheet;

import de.erichseifert.vectorgraphics2d.VectorGraphics2D;
import de.erichseifert.vectorgraphics2d.svg.SVGProcessor;
import de.erichseifert.vectorgraphics2d.util.PageSize;
import de.rototor.pdfbox.graphics2d.PdfBoxGraphics2D;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.function.Consumer;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriteParam;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import org.apache.pdfbox.cos.COSArray;
import org.apache.pdfbox.cos.COSName;
import org.apache.pdfbox.cos.COSString;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.PDPage;
import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.pdmodel.graphics.form.PDFormXObject;

/**
 * Renders a painting, given in points (1/72 in), to SVG, PNG or PDF bytes. The output depends on
 * the painting alone: no clock, no random identifier. The PDF document ID, which PDFBox would
 * otherwise derive from the time, is an MD5 digest of the page's content.
 */
public final class Drawing {
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
        return switch (format) {
            case SVG -> svg(widthPt, heightPt, painter);
            case PNG -> png(widthPt, heightPt, dpi, painter);
            case PDF -> pdf(widthPt, heightPt, painter);
        };
    }

    static void hints(Graphics2D g) {
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
    }

    private static byte[] svg(double w, double h, Consumer<Graphics2D> painter) throws IOException {
        VectorGraphics2D g = new VectorGraphics2D();
        hints(g);
        painter.accept(g);
        g.dispose();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        new SVGProcessor().getDocument(g.getCommands(), new PageSize(0, 0, w, h)).writeTo(out);
        return out.toByteArray();
    }

    private static byte[] png(double w, double h, int dpi, Consumer<Graphics2D> painter) throws IOException {
        double scale = dpi / 72.0;
        int pw = (int) Math.round(w * scale);
        int ph = (int) Math.round(h * scale);
        BufferedImage image = new BufferedImage(pw, ph, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = image.createGraphics();
        hints(g);
        g.setColor(java.awt.Color.WHITE);
        g.fillRect(0, 0, pw, ph);
        g.scale(scale, scale);
        painter.accept(g);
        g.dispose();
        return encodePng(image, dpi);
    }

    private static byte[] encodePng(BufferedImage image, int dpi) throws IOException {
        ImageWriter writer = ImageIO.getImageWritersByFormatName("png").next();
        ImageWriteParam param = writer.getDefaultWriteParam();
        IIOMetadata meta = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(image), param);
        // pHYs: pixels per metre, so viewers and printers know the intended size
        int ppm = (int) Math.round(dpi / 0.0254);
        IIOMetadataNode phys = new IIOMetadataNode("pHYs");
        phys.setAttribute("pixelsPerUnitXAxis", Integer.toString(ppm));
        phys.setAttribute("pixelsPerUnitYAxis", Integer.toString(ppm));
        phys.setAttribute("unitSpecifier", "meter");
        IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
        root.appendChild(phys);
        meta.mergeTree("javax_imageio_png_1.0", root);
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
            writer.setOutput(ios);
            writer.write(null, new IIOImage(image, null, meta), param);
        } finally {
            writer.dispose();
        }
        return out.toByteArray();
    }

    private static byte[] pdf(double w, double h, Consumer<Graphics2D> painter) throws IOException {
        try (PDDocument doc = new PDDocument()) {
            PDRectangle size = new PDRectangle((float) w, (float) h);
            PDPage page = new PDPage(size);
            doc.addPage(page);
            PdfBoxGraphics2D g = new PdfBoxGraphics2D(doc, size);
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
            doc.save(out);
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

    /**
     * Writes bytes to a stream.
     *
     * @param bytes the bytes
     * @param out the stream, left open
     * @throws IOException if writing fails
     */
    public static void copy(byte[] bytes, OutputStream out) throws IOException {
        out.write(bytes);
        out.flush();
    }

    /**
     * Text of an SVG rendering, for tests and tools.
     *
     * @param bytes SVG bytes
     * @return the text
     */
    public static String text(byte[] bytes) {
        return new String(bytes, StandardCharsets.UTF_8);
    }
}
