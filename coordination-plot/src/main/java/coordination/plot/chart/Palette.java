package coordination.plot.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;

/**
 * The project's drawing style. Device colours are taken from the colour-blind-safe set of Okabe and
 * Ito ("Color Universal Design", 2008), each paired with its own dash pattern so that curves stay
 * apart printed in grey. Cables are black; damaged regions a light warm grey.
 */
public final class Palette {
    private static final Color[] DEVICE = {
        new Color(0x00, 0x72, 0xB2), // blue
        new Color(0xD5, 0x5E, 0x00), // vermilion
        new Color(0x00, 0x9E, 0x73), // bluish green
        new Color(0xCC, 0x79, 0xA7), // reddish purple
        new Color(0xE6, 0x9F, 0x00), // orange
        new Color(0x56, 0xB4, 0xE9), // sky blue
    };
    private static final float[][] DASHES = {
        null, {9f, 3f}, {2f, 2.5f}, {9f, 3f, 2f, 3f}, {5f, 5f}, {12f, 3f, 2f, 3f, 2f, 3f},
    };

    /** Cable damage curves. */
    public static final Color CABLE = new Color(0x1A, 0x1A, 0x1A);
    private static final Color[] CABLES = {CABLE, new Color(0x66, 0x66, 0x66), new Color(0x8B, 0x4A, 0x2B)};

    /** Region above a damage curve. */
    public static final Color DAMAGED = new Color(0x99, 0x88, 0x77, 0x30);
    /** Grid lines. */
    public static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    /** Fault-current markers and annotations. */
    public static final Color MARK = new Color(0x44, 0x44, 0x44);
    /** Text of passing verdicts. */
    public static final Color PASS = new Color(0x00, 0x6D, 0x4F);
    /** Text of failing verdicts. */
    public static final Color FAIL = new Color(0xB0, 0x3A, 0x00);
    /** The font family used throughout, shipped with the jar ({@link Fonts}). */
    public static final String FONT_FAMILY = "Liberation Sans";

    private Palette() {
    }

    /**
     * A font of the house family.
     *
     * @param style {@link Font#PLAIN} or {@link Font#BOLD}
     * @param size size in points
     * @return the font
     */
    public static Font font(int style, float size) {
        return Fonts.of(style, size);
    }

    /**
     * The colour of the n-th device of a chart.
     *
     * @param n index from 0
     * @return the colour
     */
    public static Color device(int n) {
        return DEVICE[n % DEVICE.length];
    }

    /**
     * The colour of the n-th cable of a chart: black, then dark grey, then brown.
     *
     * @param n index from 0
     * @return the colour
     */
    public static Color cable(int n) {
        return CABLES[n % CABLES.length];
    }

    /**
     * The same colour, lightened for a tolerance band.
     *
     * @param n index from 0
     * @return a translucent colour
     */
    public static Color band(int n) {
        Color c = device(n);
        return new Color(c.getRed(), c.getGreen(), c.getBlue(), 0x2C);
    }

    /**
     * The damage zone's tint when a chart has several cables: lighter with each, so that where
     * the zones overlap the grey stays light and the bands stay readable on it.
     *
     * @param cables the number of cables on the chart
     * @return a translucent grey
     */
    public static Color damaged(int cables) {
        int alpha = Math.max(0x12, DAMAGED.getAlpha() / Math.max(1, cables));
        return new Color(DAMAGED.getRed(), DAMAGED.getGreen(), DAMAGED.getBlue(), alpha);
    }

    /**
     * The solid line of the n-th cable's damage limit.
     *
     * @param n index from 0
     * @param width line width in points
     * @return the stroke
     */
    public static BasicStroke cableStroke(int n, float width) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND);
    }

    /**
     * The dotted style of a let-through energy drawn as I²t / I².
     *
     * @param width line width in points
     * @return the stroke
     */
    public static BasicStroke letThrough(float width) {
        return new BasicStroke(width, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f, new float[] {0.1f, 2.6f},
                0f);
    }

    /**
     * The line style of the n-th device: colour and dash pattern change together.
     *
     * @param n index from 0
     * @param width line width in points
     * @return the stroke
     */
    public static BasicStroke deviceStroke(int n, float width) {
        // past the sixth device the colours repeat, each with another dash pattern than before
        float[] dash = DASHES[(n + n / DEVICE.length) % DASHES.length];
        return dash == null ? new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND)
                : new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, dash, 0f);
    }

    /**
     * The dashed style of cable limits outside the adiabatic window.
     *
     * @param width line width in points
     * @return the stroke
     */
    public static BasicStroke dashed(float width) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f, new float[] {4f, 3f}, 0f);
    }
}
