package coordination.core.cable;

import coordination.core.CoordinationException;
import coordination.core.internal.Checks;
import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Conductor size conversions: American Wire Gauge (ASTM B258) and kcmil to mm², and the standard
 * metric sizes of IEC 60228.
 */
public final class ConductorSizes {
    /** Square millimetres in one circular mil: π/4 × (0.0254 mm)², exact by definition. */
    public static final double MM2_PER_CMIL = Math.PI / 4.0 * 0.0254 * 0.0254;

    /** Nominal cross-sections of IEC 60228:2004, Table 1 and following, in mm². */
    private static final double[] IEC_60228_MM2 = {
        0.5, 0.75, 1, 1.5, 2.5, 4, 6, 10, 16, 25, 35, 50, 70, 95, 120, 150, 185, 240, 300, 400, 500, 630, 800, 1000,
        1200, 1400, 1600, 1800, 2000, 2500
    };

    /** AWG numbers from 30 to 4/0 (4/0 = -3), and kcmil sizes in common use above 4/0. */
    private static final String[] AWG_NAMES = {
        "30", "28", "26", "24", "22", "20", "18", "16", "14", "12", "10", "8", "6", "4", "3", "2", "1", "1/0", "2/0",
        "3/0", "4/0"
    };
    private static final double[] KCMIL_SIZES = {250, 300, 350, 400, 500, 600, 700, 750, 800, 900, 1000, 1250, 1500,
        1750, 2000};

    private static final Pattern AWG = Pattern.compile("(?i)\\s*(0{1,4}|\\d{1,2}|[1-4]/0)\\s*awg\\s*");
    private static final Pattern KCMIL = Pattern.compile("(?i)\\s*(\\d+(?:\\.\\d+)?)\\s*(kcmil|mcm)\\s*");

    private ConductorSizes() {
    }

    /**
     * Cross-section of an AWG size, from ASTM B258: {@code d = 0.005 in × 92^((36 - n) / 39)} with
     * 1/0 = 0, 2/0 = -1, 3/0 = -2, 4/0 = -3. The sizes above 1 are also written with zeros: 0 is
     * 1/0, 00 is 2/0, 000 is 3/0 and 0000 is 4/0.
     *
     * @param gauge AWG number as text: {@code "10"}, {@code "4/0"} or {@code "00"}
     * @return area in mm²
     * @throws IllegalArgumentException if the gauge is not from 40 to 4/0
     */
    public static double awgMm2(String gauge) {
        if (gauge == null || !gauge.matches("0{1,4}|\\d{1,2}|\\d/0")) {
            throw new IllegalArgumentException("AWG size: found " + gauge + " - must be from 40 to 4/0");
        }
        int n;
        if (gauge.endsWith("/0")) {
            n = 1 - Integer.parseInt(gauge.substring(0, gauge.length() - 2));
        } else if (gauge.matches("0+")) {
            n = 1 - gauge.length();
        } else {
            n = Integer.parseInt(gauge);
        }
        if (n < -3 || n > 40) {
            throw new IllegalArgumentException("AWG size: found " + gauge + " - must be from 40 to 4/0");
        }
        double mils = 5.0 * Math.pow(92.0, (36.0 - n) / 39.0);
        return mils * mils * MM2_PER_CMIL;
    }

    /**
     * Cross-section of a kcmil size.
     *
     * @param kcmil thousands of circular mils, above 0
     * @return area in mm²
     */
    public static double kcmilMm2(double kcmil) {
        Checks.positive("kcmil size", kcmil, "kcmil");
        return kcmil * 1000.0 * MM2_PER_CMIL;
    }

    /**
     * Converts an area to circular mils.
     *
     * @param mm2 area in mm²
     * @return area in circular mils
     */
    public static double cmil(double mm2) {
        return mm2 / MM2_PER_CMIL;
    }

    /**
     * Parses a size written as {@code "4/0 AWG"}, {@code "10 AWG"} or {@code "250 kcmil"} (also
     * {@code MCM}).
     *
     * @param text the size
     * @return area in mm²
     * @throws CoordinationException if the text is neither form
     */
    public static double parseMm2(String text) {
        Matcher a = AWG.matcher(text);
        if (a.matches()) {
            return awgMm2(a.group(1));
        }
        Matcher k = KCMIL.matcher(text);
        if (k.matches()) {
            double v = Double.parseDouble(k.group(1));
            if (v > 0) {
                return kcmilMm2(v);
            }
        }
        throw new CoordinationException("expected a size such as \"4/0 AWG\" or \"250 kcmil\", found '" + text + "'");
    }

    /**
     * The smallest IEC 60228 nominal size at or above an area.
     *
     * @param mm2 area in mm²
     * @return the nominal size in mm², or NaN above the largest (2500 mm²)
     */
    public static double nextIecSizeMm2(double mm2) {
        Checks.positive("conductor area", mm2, "mm2");
        for (double s : IEC_60228_MM2) {
            if (s >= mm2 * (1 - 1e-12)) {
                return s;
            }
        }
        return Double.NaN;
    }

    /**
     * The smallest AWG or kcmil size at or above an area, as text ({@code "2/0 AWG"},
     * {@code "350 kcmil"}).
     *
     * @param mm2 area in mm²
     * @return the size's name, or null above 2000 kcmil
     */
    public static String nextAwgOrKcmil(double mm2) {
        Checks.positive("conductor area", mm2, "mm2");
        for (String g : AWG_NAMES) {
            if (awgMm2(g) >= mm2 * (1 - 1e-12)) {
                return g + " AWG";
            }
        }
        for (double k : KCMIL_SIZES) {
            if (kcmilMm2(k) >= mm2 * (1 - 1e-12)) {
                return String.format(Locale.ROOT, "%.0f kcmil", k);
            }
        }
        return null;
    }

    /** @return the IEC 60228 nominal sizes in mm² (a copy) */
    public static double[] iecSizesMm2() {
        return IEC_60228_MM2.clone();
    }
}
