package coordination.plot.chart;

import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.Side;
import coordination.core.Quantities;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.knowm.xchart.AnnotationLine;
import org.knowm.xchart.AnnotationText;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.Styler;
import org.knowm.xchart.style.lines.SeriesLines;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * Builds the log-log time-current chart of a {@link ChartContent}. Curves are drawn from points
 * along the current axis with every breakpoint of a curve inserted on both sides, so that steps
 * are drawn vertical at their exact current; the drawing samples, the checks do not.
 */
public final class TimeCurrentChart {
    /** Drawing points per chart width, spread evenly in log(I). */
    private static final int POINTS = 400;
    /** Largest distance, in chart points, of a dropped drawing point from the drawn line. */
    private static final double SIMPLIFY_TOLERANCE = 0.25;
    /** Factor by which the axes reach past their end decades. */
    private static final double AXIS_SLACK = 0.995;
    /** Default time axis: 0.01 s to 1000 s. */
    private static final double TIME_MIN = 0.01;
    private static final double TIME_MAX = 1000;

    private final ChartContent content;
    private final double xMin;
    private final double xMax;
    private final double yMin;
    private final double yMax;
    private final XYChart chart;
    private final Set<String> names = new HashSet<>();
    private final int width;
    private final int height;

    /**
     * Builds a chart.
     *
     * @param content what to draw
     * @param width width in pixels (points for vector output)
     * @param height height in pixels
     */
    public TimeCurrentChart(ChartContent content, int width, int height) {
        this.content = content;
        this.width = width;
        this.height = height;
        double[] x = currentRange(content);
        this.xMin = x[0];
        this.xMax = x[1];
        this.yMin = timeMin(content, xMax);
        this.yMax = TIME_MAX;
        this.chart = new XYChartBuilder().width(width).height(height).title(content.title())
                .xAxisTitle("Current (A) at " + Quantities.asGiven(content.referenceKv()) + " kV")
                .yAxisTitle("Time (s)").build();
        style(width);
        draw();
    }

    /** @return the XChart chart, ready to paint */
    public XYChart chart() {
        return chart;
    }

    /** @return the current axis range in amperes, [min, max], whole decades */
    public double[] currentAxis() {
        return new double[] {xMin, xMax};
    }

    /** @return the time axis range in seconds, [min, max], whole decades */
    public double[] timeAxis() {
        return new double[] {yMin, yMax};
    }

    static double[] currentRange(ChartContent c) {
        // from the lowest pickup (or the lowest fault current) to the highest fault current
        double lo = Double.POSITIVE_INFINITY;
        double hi = 0;
        for (ProtectiveDevice d : c.devices()) {
            double[] b = d.maximumCurve().breakpointsAmps();
            if (b.length > 0) {
                lo = Math.min(lo, b[0]);
                hi = Math.max(hi, b[0] * 20);
            }
            if (d.minimumCurve().lowestDefinedAmps() > 0) {
                lo = Math.min(lo, d.minimumCurve().lowestDefinedAmps());
            }
        }
        if (!Double.isNaN(c.faultMinAmps())) {
            lo = Math.min(lo, c.faultMinAmps());
            hi = c.faultMaxAmps() * 1.5;
        }
        for (GradingCheckResult g : c.gradingResults()) {
            hi = Math.max(hi, g.toAmps() * 1.5);
        }
        if (!(hi > 0) || Double.isInfinite(lo)) {
            return new double[] {10, 100_000};
        }
        double dlo = Math.pow(10, Math.floor(Math.log10(lo * 0.9)));
        double dhi = Math.pow(10, Math.ceil(Math.log10(hi)));
        if (dhi / dlo < 100) {
            dhi = dlo * 100;
        }
        if (dhi / dlo > 1e6) {
            dlo = dhi / 1e6;
        }
        return new double[] {dlo, dhi};
    }

    private static double timeMin(ChartContent c, double xMax) {
        for (ProtectiveDevice d : c.devices()) {
            TimeCurrentCurve min = d.minimumCurve();
            double at = Math.min(xMax, min.highestDefinedAmps());
            double t = min.isDefinedAt(at) ? min.seconds(at) : Double.NaN;
            if (t > 0 && t < TIME_MIN) {
                return TIME_MIN / 10;
            }
        }
        return TIME_MIN;
    }

    private void style(int width) {
        var s = chart.getStyler();
        float base = Math.max(7f, width / 80f);
        s.setXAxisLogarithmic(true);
        s.setYAxisLogarithmic(true);
        s.setXAxisLogarithmicDecadeOnly(true);
        s.setYAxisLogarithmicDecadeOnly(true);
        // a hair beyond the decades, so that the end decades get their labels too
        s.setXAxisMin(xMin * AXIS_SLACK);
        s.setXAxisMax(xMax / AXIS_SLACK);
        s.setYAxisMin(yMin * AXIS_SLACK);
        s.setYAxisMax(yMax / AXIS_SLACK);
        s.setPlotContentSize(0.995);
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotBorderColor(Palette.MARK);
        s.setPlotGridLinesColor(Palette.GRID);
        s.setPlotGridLinesStroke(new BasicStroke(0.5f));
        s.setChartTitleVisible(false);
        s.setChartTitleFont(Palette.font(Font.BOLD, base + 2));
        s.setAxisTitleFont(Palette.font(Font.PLAIN, base + 1));
        s.setAxisTickLabelsFont(Palette.font(Font.PLAIN, base));
        s.setLegendFont(Palette.font(Font.PLAIN, base));
        s.setLegendPosition(Styler.LegendPosition.OutsideS);
        s.setLegendLayout(Styler.LegendLayout.Horizontal);
        s.setLegendBorderColor(Color.WHITE);
        s.setLegendSeriesLineLength(Math.round(base * 3));
        s.setMarkerSize(Math.round(base));
        s.setAnnotationTextFont(Palette.font(Font.PLAIN, base - 0.5f));
        s.setAnnotationTextFontColor(Palette.MARK);
        s.setAnnotationLineColor(Palette.MARK);
        s.setAnnotationLineStroke(Palette.dashed(0.8f));
        s.setXAxisTickLabelsFormattingFunction(TimeCurrentChart::amps);
        s.setYAxisTickLabelsFormattingFunction(TimeCurrentChart::seconds);
        s.setAntiAlias(true);
    }

    /**
     * Tick label of a current: 10, 100, 1k, 10k, 100k.
     *
     * @param amps amperes
     * @return the label
     */
    public static String amps(Double amps) {
        double a = amps;
        if (a >= 1e6) {
            return trim(a / 1e6) + "M";
        }
        if (a >= 1e3) {
            return trim(a / 1e3) + "k";
        }
        return trim(a);
    }

    /**
     * Tick label of a time: 0.01, 0.1, 1, 10, 100, 1000.
     *
     * @param seconds seconds
     * @return the label
     */
    public static String seconds(Double seconds) {
        return trim(seconds);
    }

    private static String trim(double v) {
        String s = String.format(Locale.ROOT, "%.3f", v);
        s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
        return s;
    }

    /**
     * Drops points that lie within a fraction of a point of the straight line (on the log-log
     * chart) between their neighbours (Douglas-Peucker). Fewer, longer segments keep dash patterns
     * visible, since a dash pattern starts anew on every segment.
     */
    private double[][] simplify(double[] x, double[] y) {
        int n = x.length;
        if (n < 3) {
            return new double[][] {x, y};
        }
        double sx = width / Math.log10(xMax / xMin);
        double sy = height / Math.log10(yMax * 10 / (yMin / 10));
        double[] u = new double[n];
        double[] v = new double[n];
        for (int i = 0; i < n; i++) {
            u[i] = Math.log10(x[i]) * sx;
            v[i] = Math.log10(y[i]) * sy;
        }
        boolean[] keep = new boolean[n];
        keep[0] = true;
        keep[n - 1] = true;
        java.util.ArrayDeque<int[]> stack = new java.util.ArrayDeque<>();
        stack.push(new int[] {0, n - 1});
        while (!stack.isEmpty()) {
            int[] r = stack.pop();
            int a = r[0];
            int b = r[1];
            double dx = u[b] - u[a];
            double dy = v[b] - v[a];
            double len = Math.hypot(dx, dy);
            int worst = -1;
            double worstDist = SIMPLIFY_TOLERANCE;
            for (int i = a + 1; i < b; i++) {
                double d = len == 0 ? Math.hypot(u[i] - u[a], v[i] - v[a])
                        : Math.abs(dy * (u[i] - u[a]) - dx * (v[i] - v[a])) / len;
                if (d > worstDist) {
                    worstDist = d;
                    worst = i;
                }
            }
            if (worst >= 0) {
                keep[worst] = true;
                stack.push(new int[] {a, worst});
                stack.push(new int[] {worst, b});
            }
        }
        int m = 0;
        for (boolean k : keep) {
            m += k ? 1 : 0;
        }
        double[] ox = new double[m];
        double[] oy = new double[m];
        int j = 0;
        for (int i = 0; i < n; i++) {
            if (keep[i]) {
                ox[j] = x[i];
                oy[j++] = y[i];
            }
        }
        return new double[][] {ox, oy};
    }

    private XYSeries line(String name, double[] x, double[] y) {
        double[][] s = simplify(x, y);
        return chart.addSeries(unique(name), s[0], s[1]);
    }

    private String unique(String name) {
        String n = name;
        int k = 2;
        while (!names.add(n)) {
            n = name + " (" + k++ + ")";
        }
        return n;
    }

    private void draw() {
        // shaded damaged regions first, so that every line is drawn over them
        for (CableThermalLimit cable : content.cables()) {
            damagedRegion(cable);
        }
        int n = 0;
        for (ProtectiveDevice d : content.devices()) {
            device(d, n++);
        }
        int k = 0;
        for (CableThermalLimit cable : content.cables()) {
            cable(cable, k++);
        }
        faultMarkers();
        results();
    }

    private double[] grid(TimeCurrentCurve curve) {
        double lo = Math.max(xMin, curve.lowestDefinedAmps());
        double hi = Math.min(xMax, curve.highestDefinedAmps());
        if (!(hi > lo)) {
            return new double[0];
        }
        double[] b = curve.breakpointsAmps();
        double[] x = new double[POINTS + 1 + 2 * b.length];
        int k = 0;
        for (int i = 0; i <= POINTS; i++) {
            x[k++] = lo * Math.pow(hi / lo, (double) i / POINTS);
        }
        for (double v : b) {
            if (v > lo && v < hi) {
                x[k++] = v * (1 - 1e-9);
                x[k++] = v;
            }
        }
        double[] out = Arrays.copyOf(x, k);
        Arrays.sort(out);
        out[out.length - 1] = hi;
        return out;
    }

    private double clipTime(double t) {
        if (Double.isInfinite(t) || t > yMax * 10) {
            return yMax * 10;
        }
        return Math.max(t, yMin / 10);
    }

    private double[] times(TimeCurrentCurve curve, double[] x) {
        double[] y = new double[x.length];
        for (int i = 0; i < x.length; i++) {
            y[i] = clipTime(curve.seconds(x[i]));
        }
        return y;
    }

    private void device(ProtectiveDevice d, int index) {
        TimeCurrentCurve max = d.maximumCurve();
        TimeCurrentCurve min = d.minimumCurve();
        double[] xMaxCurve = grid(max);
        double[] xMinCurve = grid(min);
        if (xMaxCurve.length == 0) {
            return;
        }
        double[] yMaxCurve = times(max, xMaxCurve);
        double[] yMinCurve = times(min, xMinCurve);
        // the band: for fuses and breakers from fastest to total clearing; for a relay the spread of its
        // operating time (tolerance, the band beyond its effective range, an assumed instantaneous time),
        // with the clearing time drawn as a line of its own
        TimeCurrentCurve upper = d.kind() == coordination.core.curve.DeviceKind.RELAY ? d.slowestOperatingCurve() : max;
        double[] xUpper = grid(upper);
        double[] yUpper = times(upper, xUpper);
        if (xMinCurve.length > 0 && xUpper.length > 0 && !Arrays.equals(yMinCurve, yUpper)) {
            double[] px = new double[xMinCurve.length + xUpper.length];
            double[] py = new double[px.length];
            for (int i = 0; i < xMinCurve.length; i++) {
                px[i] = xMinCurve[i];
                py[i] = yMinCurve[i];
            }
            for (int i = 0; i < xUpper.length; i++) {
                px[xMinCurve.length + i] = xUpper[xUpper.length - 1 - i];
                py[xMinCurve.length + i] = yUpper[xUpper.length - 1 - i];
            }
            double[][] outline = simplify(px, py);
            XYSeries band = chart.addSeries(unique(d.id() + " band"), outline[0], outline[1]);
            band.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
            band.setFillColor(Palette.band(index));
            // XChart skips an outline only for its own NONE object: an invisible stroke is still written
            band.setLineStyle(SeriesLines.NONE);
            band.setMarker(SeriesMarkers.NONE);
            band.setShowInLegend(false);
        }
        if (xMinCurve.length > 0 && !Arrays.equals(yMinCurve, yMaxCurve)) {
            XYSeries low = line(d.id() + " minimum", xMinCurve, yMinCurve);
            low.setLineColor(Palette.device(index));
            low.setLineStyle(Palette.deviceStroke(index, 0.6f));
            low.setMarker(SeriesMarkers.NONE);
            low.setShowInLegend(false);
        }
        XYSeries s = line(d.id(), xMaxCurve, yMaxCurve);
        s.setLineColor(Palette.device(index));
        s.setLineStyle(Palette.deviceStroke(index, 1.6f));
        s.setMarker(SeriesMarkers.NONE);
    }

    private void damagedRegion(CableThermalLimit cable) {
        int n = POINTS / 2;
        double[] x = new double[n + 3];
        double[] y = new double[n + 3];
        for (int i = 0; i <= n; i++) {
            x[i] = xMin * Math.pow(xMax / xMin, (double) i / n);
            y[i] = clipTime(cable.damageSeconds(x[i]));
        }
        x[n + 1] = xMax;
        y[n + 1] = yMax * 10;
        x[n + 2] = xMin;
        y[n + 2] = yMax * 10;
        double[][] outline = simplify(x, y);
        XYSeries s = chart.addSeries(unique(cable.id() + " damaged"), outline[0], outline[1]);
        s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.PolygonArea);
        s.setFillColor(Palette.DAMAGED);
        s.setLineStyle(SeriesLines.NONE);
        s.setMarker(SeriesMarkers.NONE);
        s.setShowInLegend(false);
    }

    private void cable(CableThermalLimit cable, int index) {
        // inside the adiabatic window solid, outside it dashed; the cable's name beside its 1 s point
        Color colour = Palette.cable(index);
        double iLong = cable.withstandAmps(CableThermalLimit.ADIABATIC_MAX_SECONDS);
        double iShort = cable.withstandAmps(CableThermalLimit.ADIABATIC_MIN_SECONDS);
        addCablePart(cable, xMin, iLong, false, cable.id() + " limit above 5 s", colour);
        addCablePart(cable, iLong, iShort, true, cable.id() + " damage limit", colour);
        addCablePart(cable, iShort, xMax, false, cable.id() + " limit below 0.1 s", colour);
        double at = cable.withstandAmps(1.0);
        if (content.cables().size() > 1 && at > xMin && at < xMax) {
            chart.addAnnotation(new AnnotationText(cable.id(), at * 1.9, 1.3, false));
        }
    }

    private void addCablePart(CableThermalLimit cable, double from, double to, boolean solid, String name,
            Color colour) {
        double lo = Math.max(from, xMin);
        double hi = Math.min(to, xMax);
        if (!(hi > lo)) {
            return;
        }
        int n = Math.max(8, (int) (POINTS * Math.log(hi / lo) / Math.log(xMax / xMin)));
        double[] x = new double[n + 1];
        double[] y = new double[n + 1];
        for (int i = 0; i <= n; i++) {
            x[i] = i == n ? hi : lo * Math.pow(hi / lo, (double) i / n);
            y[i] = clipTime(cable.damageSeconds(x[i]));
        }
        XYSeries s = line(name, x, y);
        s.setLineColor(colour);
        s.setLineStyle(solid ? new BasicStroke(2.2f) : Palette.dashed(1.6f));
        s.setMarker(SeriesMarkers.NONE);
        s.setShowInLegend(solid);
    }

    private void faultMarkers() {
        if (Double.isNaN(content.faultMinAmps())) {
            return;
        }
        for (double[] m : new double[][] {{content.faultMinAmps(), 0}, {content.faultMaxAmps(), 1}}) {
            if (m[0] < xMin || m[0] > xMax) {
                continue;
            }
            chart.addAnnotation(new AnnotationLine(m[0], true, false));
            String label = (m[1] == 0 ? "Ik min " : "Ik max ") + Quantities.current(m[0], 3);
            chart.addAnnotation(new AnnotationText(label, m[0], yMax / (m[1] == 0 ? 2.2 : 1.4), false));
        }
    }

    private void results() {
        List<double[]> crossing = new ArrayList<>();
        int labels = 0;
        for (CableCheckResult r : content.cableResults()) {
            CableThermalLimit cable = content.cables().stream().filter(c -> c.id().equals(r.cable())).findFirst()
                    .orElse(null);
            if (cable == null) {
                continue;
            }
            for (double c : r.crossingsAmps()) {
                crossing.add(new double[] {c, cable.damageSeconds(c)});
            }
            if (Double.isFinite(r.minMarginSeconds()) && r.minMarginAtAmps() >= xMin && r.minMarginAtAmps() <= xMax) {
                double at = r.minMarginAtAmps();
                double probe = r.minMarginSide() == Side.BELOW ? at * (1 - 1e-9) : at;
                ProtectiveDevice d = content.devices().stream().filter(x -> x.id().equals(r.device())).findFirst()
                        .orElse(null);
                if (d == null || !d.maximumCurve().isDefinedAt(probe)) {
                    continue;
                }
                double t = clipTime(d.maximumCurve().seconds(probe));
                XYSeries p = chart.addSeries(unique("min margin " + r.device()), new double[] {at}, new double[] {t});
                p.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
                p.setMarker(SeriesMarkers.DIAMOND);
                p.setMarkerColor(Palette.MARK);
                p.setShowInLegend(false);
                double labelY = Math.max(t / 2.2 * Math.pow(0.45, labels), yMin * 1.5);
                labels++;
                chart.addAnnotation(new AnnotationText("min margin " + Quantities.significant(r.minMarginSeconds(), 3)
                        + " s" + (content.cableResults().size() > 1 ? " (" + r.cable() + ")" : ""), at, labelY, false));
            }
        }
        for (GradingCheckResult r : content.gradingResults()) {
            ProtectiveDevice up = content.devices().stream().filter(x -> x.id().equals(r.upstream())).findFirst()
                    .orElse(null);
            if (up == null) {
                continue;
            }
            for (double c : r.crossingsAmps()) {
                if (up.minimumCurve().isDefinedAt(c)) {
                    crossing.add(new double[] {c, up.minimumCurve().seconds(c)});
                }
            }
        }
        crossing.removeIf(p -> p[0] < xMin || p[0] > xMax || !Double.isFinite(p[1]));
        if (!crossing.isEmpty()) {
            double[] x = crossing.stream().mapToDouble(p -> p[0]).toArray();
            double[] y = crossing.stream().mapToDouble(p -> clipTime(p[1])).toArray();
            XYSeries s = chart.addSeries(unique("crossing"), x, y);
            s.setXYSeriesRenderStyle(XYSeries.XYSeriesRenderStyle.Scatter);
            s.setMarker(SeriesMarkers.CROSS);
            s.setMarkerColor(Palette.FAIL);
            for (double[] p : crossing) {
                chart.addAnnotation(new AnnotationText(Quantities.current(p[0], 3), p[0] * 1.5, clipTime(p[1]) * 1.7,
                        false));
            }
        }
    }
}
