package coordination.plot.chart;

import java.awt.Font;
import java.awt.FontFormatException;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The faces every sheet is drawn in, Liberation Sans Regular and Bold (SIL Open Font License 1.1),
 * shipped with the jar, so that text is measured and drawn alike on every machine and can be
 * embedded in SVG and PDF.
 */
public final class Fonts {
    /** Resource folder of the font files, from the class path root. */
    public static final String FOLDER = "coordination/plot/fonts/";
    /** File of the regular face. */
    public static final String REGULAR_FILE = "LiberationSans-Regular.ttf";
    /** File of the bold face. */
    public static final String BOLD_FILE = "LiberationSans-Bold.ttf";

    private static final Font REGULAR = load(REGULAR_FILE);
    private static final Font BOLD = load(BOLD_FILE);

    private Fonts() {
    }

    /**
     * The regular or bold face at a size.
     *
     * @param style {@link Font#PLAIN} or {@link Font#BOLD}
     * @param size size in points
     * @return the font
     */
    public static Font of(int style, float size) {
        return (style & Font.BOLD) != 0 ? BOLD.deriveFont(Font.BOLD, size) : REGULAR.deriveFont(Font.PLAIN, size);
    }

    /**
     * The bytes of a face's file.
     *
     * @param file {@link #REGULAR_FILE} or {@link #BOLD_FILE}
     * @return an open stream; the caller closes it
     */
    public static InputStream open(String file) {
        InputStream in = Fonts.class.getClassLoader().getResourceAsStream(FOLDER + file);
        if (in == null) {
            throw new IllegalStateException("font " + FOLDER + file + " is missing from the class path");
        }
        return in;
    }

    private static Font load(String file) {
        try (InputStream in = open(file)) {
            return Font.createFont(Font.TRUETYPE_FONT, in);
        } catch (IOException e) {
            throw new UncheckedIOException("font " + file + " could not be read", e);
        } catch (FontFormatException e) {
            throw new IllegalStateException("font " + file + " is not a TrueType font", e);
        }
    }
}
