package coordination.plot.chart;

import coordination.core.Quantities;
import coordination.core.cable.CableThermalLimit;
import coordination.core.curve.DeviceKind;
import coordination.core.curve.LetThroughEnergy;
import coordination.core.curve.ProtectiveDevice;
import coordination.core.curve.TimeCurrentCurve;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.GradingCheckResult;
import coordination.core.margin.Side;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.Stroke;
import java.awt.font.FontRenderContext;
import java.awt.geom.AffineTransform;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashSet;
import java.util.List;
import java.util.Optional;
import java.util.Set;
import org.knowm.xchart.XYChart;
import org.knowm.xchart.XYChartBuilder;
import org.knowm.xchart.XYSeries;
import org.knowm.xchart.style.lines.SeriesLines;
import org.knowm.xchart.style.markers.SeriesMarkers;

/**
 * The log-log time-current chart of a {@link ChartContent}. XChart draws the plot area: the grid,
 * the curves and the shaded bands and zones. Everything that is text (tick labels, axis titles,
 * the legend and the labels of fault currents, margins, crossings and ranges) and the markers
 * are drawn here with {@code drawString}, so that SVG and PDF keep them as text. Labels are
 * placed where they touch no line, no marker and no other label and stay inside the plot; a
 * label that finds no such place is listed under the legend instead.
 *
 * <p>Curves are drawn from points along the current axis with every breakpoint of a curve
 * inserted on both sides, so that steps are drawn vertical at their exact current; the drawing
 * samples, the checks do not.
 */
public final class TimeCurrentChart {
    /** Drawing points per chart width, spread evenly in log(I). */
    private static final int POINTS = 400;
    /** Largest distance, in chart points, of a dropped drawing point from the drawn line. */
    private static final double SIMPLIFY_TOLERANCE = 0.25;
    /** Default time axis: 0.01 s to 1000 s. */
    private static final double TIME_MIN = 0.01;
    private static final double TIME_MAX = 1000;
    /** Length of a legend's line sample, in points. */
    private static final double SAMPLE = 22;

    private static final FontRenderContext FRC = new FontRenderContext(null, true, true);

    private final ChartContent content;
    private final double xMin;
    private final double xMax;
    private final double yMin;
    private final double yMax;
    private final XYChart chart;
    private final Set<String> names = new HashSet<>();
    private final int width;
    private final int height;
    private final float base;
    /** Drawn polylines in data space, which labels must not touch. */
    private final List<double[][]> lines = new ArrayList<>();
    private final List<LegendEntry> legendEntries = new ArrayList<>();
    private final List<Mark> marks = new ArrayList<>();
    private final List<Bar> bars = new ArrayList<>();
    private final Layout layout;

    /**
     * A piece of text on the chart and the box it takes, in chart points.
     *
     * @param text the text
     * @param box its bounding box
     */
    public record Label(String text, Rectangle2D box) {
    }

    /**
     * Where everything is, in chart points from the chart's top left corner.
     *
     * @param plot the plot area
     * @param labels the labels placed inside the plot
     * @param legend the legend entries, each with its line sample
     * @param lines the drawn line segments the labels avoid (curves, fault-current and range lines)
     * @param markers the boxes of the markers
     * @param unplaced labels that found no free place and are listed under the legend
     */
    public record Layout(Rectangle2D plot, List<Label> labels, List<Label> legend, List<Line2D> lines,
            List<Rectangle2D> markers, List<String> unplaced) {
    }

    private record LegendEntry(String text, Color colour, Stroke stroke, boolean swatch) {
    }

    /** A marker in data space: a diamond (minimum margin) or a cross (crossing), with its label. */
    private record Mark(double amps, double seconds, boolean diamond, String label) {
    }

    /** A current range drawn as a bar along the bottom of the plot, with its label. */
    private record Bar(double fromAmps, double toAmps, Color colour, String label) {
    }

    /**
     * Builds a chart.
     *
     * @param content what to draw
     * @param width width in points
     * @param height height in points
     */
    public TimeCurrentChart(ChartContent content, int width, int height) {
        this.content = content;
        this.width = width;
        this.height = height;
        this.base = Math.max(7f, width / 80f);
        double[] x = currentRange(content);
        this.xMin = x[0];
        this.xMax = x[1];
        this.yMin = timeMin(content, xMax);
        this.yMax = TIME_MAX;
        this.chart = new XYChartBuilder().width(width).height(height).title(content.title()).build();
        style();
        draw();
        this.layout = layOut();
    }

    /** @return the XChart chart of the plot area (grid, curves, bands); its own text is turned off */
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

    /** @return where the plot, the labels and the legend are */
    public Layout layout() {
        return layout;
    }

    /** @return the title of the current axis */
    public String currentAxisTitle() {
        return "Current at " + Quantities.asGiven(content.referenceKv()) + " kV";
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
            if (d.letThrough().isPresent()) {
                return TIME_MIN / 10;
            }
        }
        return TIME_MIN;
    }

    private void style() {
        var s = chart.getStyler();
        s.setXAxisLogarithmic(true);
        s.setYAxisLogarithmic(true);
        s.setXAxisLogarithmicDecadeOnly(true);
        s.setYAxisLogarithmicDecadeOnly(true);
        s.setXAxisMin(xMin);
        s.setXAxisMax(xMax);
        s.setYAxisMin(yMin);
        s.setYAxisMax(yMax);
        // the plot fills the area it is painted into, so that data map to points as in toX and toY
        s.setPlotContentSize(1.0);
        s.setChartPadding(0);
        s.setPlotMargin(0);
        s.setAxisTicksVisible(false);
        s.setXAxisTitleVisible(false);
        s.setYAxisTitleVisible(false);
        s.setLegendVisible(false);
        s.setChartTitleVisible(false);
        s.setChartBackgroundColor(Color.WHITE);
        s.setPlotBackgroundColor(Color.WHITE);
        s.setPlotBorderColor(Palette.MARK);
        s.setPlotGridLinesColor(Palette.GRID);
        s.setPlotGridLinesStroke(new BasicStroke(0.5f));
        s.setAntiAlias(true);
    }

    /**
     * Tick label of a current: 10 A, 100 A, 1 kA, 10 kA, 100 kA, 1 MA.
     *
     * @param amps amperes
     * @return the label
     */
    public static String amps(Double amps) {
        double a = amps;
        if (a >= 1e6) {
            return trim(a / 1e6) + " MA";
        }
        if (a >= 1e3) {
            return trim(a / 1e3) + " kA";
        }
        return trim(a) + " A";
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

    /**
     * A tick value to three decimals without trailing zeros: the digits of {@code %.3f}, rounded
     * half up from the shortest decimal of the double as the formatter rounds them, without the
     * formatter's pattern parsing, which costs a cold start more than the rest of a tick label.
     */
    static String trim(double v) {
        return java.math.BigDecimal.valueOf(v).setScale(3, java.math.RoundingMode.HALF_UP).stripTrailingZeros()
                .toPlainString();
    }

    // ------------------------------------------------------------------------------------ series

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
        lines.add(s);
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
        // shaded damage zones first, so that every line is drawn over them
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
        // the band: for fuses from melting to clearing, for breakers their tolerance, for a relay the
        // spread of its operating time, with the clearing time drawn as a line of its own
        TimeCurrentCurve upper = d.kind() == DeviceKind.RELAY ? d.slowestOperatingCurve() : max;
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
        }
        XYSeries s = line(d.id(), xMaxCurve, yMaxCurve);
        s.setLineColor(Palette.device(index));
        s.setLineStyle(Palette.deviceStroke(index, 1.6f));
        s.setMarker(SeriesMarkers.NONE);
        legendEntries.add(new LegendEntry(d.id(), Palette.device(index), Palette.deviceStroke(index, 1.6f), false));
        d.letThrough().ifPresent(e -> letThrough(d, e, index));
    }

    /**
     * A stated let-through energy E(I) drawn where it is used, as the time E / I² that a current
     * of constant value would need: thin and dotted in the device's colour, from where the
     * device's curve ends (or its energy starts) to the top of the axis.
     */
    private void letThrough(ProtectiveDevice d, LetThroughEnergy e, int index) {
        double from = d.kind() == DeviceKind.FUSE ? d.maximumCurve().highestDefinedAmps() : d.letThroughFromAmps();
        double lo = Math.max(from, xMin);
        double hi = xMax;
        if (!(hi > lo)) {
            return;
        }
        int n = Math.max(8, (int) (POINTS * Math.log(hi / lo) / Math.log(xMax / xMin)));
        double[] x = new double[n + 1];
        double[] y = new double[n + 1];
        int k = 0;
        for (int i = 0; i <= n; i++) {
            double a = i == n ? hi : lo * Math.pow(hi / lo, (double) i / n);
            if (e.isDefinedAt(a)) {
                x[k] = a;
                y[k++] = clipTime(e.a2s(a) / (a * a));
            }
        }
        if (k < 2) {
            return;
        }
        XYSeries s = line(d.id() + " let-through", Arrays.copyOf(x, k), Arrays.copyOf(y, k));
        s.setLineColor(Palette.device(index));
        s.setLineStyle(Palette.letThrough(1.1f));
        s.setMarker(SeriesMarkers.NONE);
        legendEntries.add(new LegendEntry(d.id() + " let-through I²t / I²", Palette.device(index),
                Palette.letThrough(1.1f), false));
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
        s.setFillColor(Palette.damaged(content.cables().size()));
        s.setLineStyle(SeriesLines.NONE);
        s.setMarker(SeriesMarkers.NONE);
        s.setShowInLegend(false);
    }

    private void cable(CableThermalLimit cable, int index) {
        // inside the adiabatic window solid, outside it dashed
        Color colour = Palette.cable(index);
        double iLong = cable.withstandAmps(CableThermalLimit.ADIABATIC_MAX_SECONDS);
        double iShort = cable.withstandAmps(CableThermalLimit.ADIABATIC_MIN_SECONDS);
        addCablePart(cable, xMin, iLong, false, cable.id() + " limit above 5 s", colour, index);
        addCablePart(cable, iLong, iShort, true, cable.id() + " damage limit", colour, index);
        addCablePart(cable, iShort, xMax, false, cable.id() + " limit below 0.1 s", colour, index);
        legendEntries.add(new LegendEntry(cable.id() + " damage limit", colour, Palette.cableStroke(index, 2.2f),
                false));
    }

    private void addCablePart(CableThermalLimit cable, double from, double to, boolean solid, String name,
            Color colour, int index) {
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
        s.setLineStyle(solid ? Palette.cableStroke(index, 2.2f) : Palette.dashed(1.6f));
        s.setMarker(SeriesMarkers.NONE);
    }

    private Optional<ProtectiveDevice> device(String id) {
        return content.devices().stream().filter(x -> x.id().equals(id)).findFirst();
    }

    private void results() {
        boolean many = content.cableResults().size() > 1;
        for (CableCheckResult r : content.cableResults()) {
            CableThermalLimit cable = content.cables().stream().filter(c -> c.id().equals(r.cable())).findFirst()
                    .orElse(null);
            if (cable == null) {
                continue;
            }
            for (double c : r.crossingsAmps()) {
                marks.add(new Mark(c, cable.damageSeconds(c), false, Quantities.current(c, 3)));
            }
            Optional<ProtectiveDevice> d = device(r.device());
            if (Double.isFinite(r.minMarginSeconds()) && d.isPresent()) {
                double at = r.minMarginAtAmps();
                double probe = r.minMarginSide() == Side.BELOW ? at * (1 - 1e-9) : at;
                double t = Double.NaN;
                if (d.get().maximumCurve().isDefinedAt(probe)) {
                    t = d.get().maximumCurve().seconds(probe);
                } else if (d.get().letThrough().isPresent() && d.get().letThrough().get().isDefinedAt(at)) {
                    // the minimum lies where the let-through energy decides: on its E / I² line
                    t = d.get().letThrough().get().a2s(at) / (at * at);
                }
                if (Double.isFinite(t)) {
                    marks.add(new Mark(at, t, true, "least margin " + Quantities.significant(r.minMarginSeconds(), 3)
                            + " s" + (many ? " (" + r.cable() + ")" : "")));
                }
            }
        }
        java.util.Map<List<Double>, Integer> ranges = new java.util.LinkedHashMap<>();
        for (GradingCheckResult r : content.gradingResults()) {
            Optional<ProtectiveDevice> up = device(r.upstream());
            for (double c : r.crossingsAmps()) {
                if (up.isPresent() && up.get().minimumCurve().isDefinedAt(c)) {
                    marks.add(new Mark(c, up.get().minimumCurve().seconds(c), false, Quantities.current(c, 3)));
                }
            }
            ranges.merge(List.of(r.fromAmps(), r.toAmps()), 1, Integer::sum);
        }
        // one bar per distinct grading range, so that checks over the same currents share it
        for (var e : ranges.entrySet()) {
            double from = e.getKey().get(0);
            double to = e.getKey().get(1);
            bars.add(new Bar(from, to, Palette.MARK, "grading range " + Quantities.current(from, 3) + " to "
                    + Quantities.current(to, 3) + (e.getValue() > 1 ? " (" + e.getValue() + " checks)" : "")));
        }
    }

    // ------------------------------------------------------------------------------------ layout

    private Font tickFont() {
        return Palette.font(Font.PLAIN, base);
    }

    private Font titleFont() {
        return Palette.font(Font.PLAIN, base + 1);
    }

    private Font labelFont() {
        return Palette.font(Font.PLAIN, base - 0.5f);
    }

    private static Rectangle2D bounds(String s, Font f) {
        Rectangle2D r = f.getStringBounds(s, FRC);
        // ascent to descent, without the leading, so that boxes are the ink's height
        return new Rectangle2D.Double(0, 0, r.getWidth(), f.getLineMetrics(s, FRC).getAscent()
                + f.getLineMetrics(s, FRC).getDescent());
    }

    private List<Double> decades(double lo, double hi) {
        List<Double> out = new ArrayList<>();
        for (double v = lo; v <= hi * 1.0000001; v *= 10) {
            out.add(Math.pow(10, Math.rint(Math.log10(v))));
        }
        return out;
    }

    private Layout layOut() {
        // labels that find no place are listed under the legend, which takes room from the plot: the
        // second pass reserves that room and places the others in the smaller plot; what it cannot
        // place joins the list
        Layout first = tryLayout(List.of());
        if (first.unplaced().isEmpty()) {
            return first;
        }
        return tryLayout(first.unplaced());
    }

    private Layout tryLayout(List<String> reserve) {
        double yTickW = 0;
        for (double t : decades(yMin, yMax)) {
            yTickW = Math.max(yTickW, bounds(seconds(t), tickFont()).getWidth());
        }
        double tickH = bounds("0", tickFont()).getHeight();
        double titleH = bounds("Time (s)", titleFont()).getHeight();
        double left = Math.ceil(titleH + 6 + yTickW + 5);
        double bottom = Math.ceil(tickH + 5 + titleH + 6);
        List<Label> legend = legend(left, reserve, 0);
        double legendH = legend.isEmpty() ? 0 : legend.get(legend.size() - 1).box().getMaxY() + 4;
        double top = 6;
        double plotW = Math.floor(width - left - 12);
        double plotH = Math.floor(height - top - bottom - legendH);
        Rectangle2D plot = new Rectangle2D.Double(left, top, plotW, Math.max(plotH, 40));

        List<Line2D> segments = new ArrayList<>();
        for (double[][] l : lines) {
            for (int i = 1; i < l[0].length; i++) {
                segments.add(clipped(plot, toX(plot, l[0][i - 1]), toY(plot, l[1][i - 1]), toX(plot, l[0][i]),
                        toY(plot, l[1][i])));
            }
        }
        for (ChartContent.FaultRange f : content.faults()) {
            for (double a : new double[] {f.minAmps(), f.maxAmps()}) {
                if (a >= xMin && a <= xMax) {
                    double px = toX(plot, a);
                    segments.add(new Line2D.Double(px, plot.getMinY(), px, plot.getMaxY()));
                }
            }
        }
        for (int i = 0; i < bars.size(); i++) {
            double[] b = barLine(plot, bars.get(i), i);
            if (b != null) {
                segments.add(new Line2D.Double(b[0], b[2], b[1], b[2]));
            }
        }
        segments.removeIf(s -> s == null);
        List<Rectangle2D> markerBoxes = new ArrayList<>();
        for (Mark m : marks) {
            if (inAxes(m.amps(), m.seconds())) {
                double px = toX(plot, m.amps());
                double py = toY(plot, m.seconds());
                markerBoxes.add(new Rectangle2D.Double(px - 4, py - 4, 8, 8));
            }
        }
        List<Label> placed = new ArrayList<>();
        List<String> unplaced = new ArrayList<>();
        Font lf = labelFont();
        // fault currents first: they are read most
        for (ChartContent.FaultRange f : content.faults()) {
            String who = f.cable().isEmpty() ? "" : " " + f.cable();
            place(placed, unplaced, "Ik max" + who + " " + Quantities.current(f.maxAmps(), 3), f.maxAmps(), yMax / 2,
                    plot, segments, markerBoxes, lf, true);
            place(placed, unplaced, "Ik min" + who + " " + Quantities.current(f.minAmps(), 3), f.minAmps(), yMax / 2,
                    plot, segments, markerBoxes, lf, true);
        }
        for (Mark m : marks) {
            if (inAxes(m.amps(), m.seconds())) {
                place(placed, unplaced, m.label(), m.amps(), m.seconds(), plot, segments, markerBoxes, lf, false);
            } else {
                unplaced.add(m.label());
            }
        }
        if (content.cables().size() > 1) {
            for (CableThermalLimit c : content.cables()) {
                double at = c.withstandAmps(1.0);
                if (at > xMin && at < xMax) {
                    place(placed, unplaced, c.id(), at, 1.0, plot, segments, markerBoxes, lf, false);
                }
            }
        }
        for (int i = 0; i < bars.size(); i++) {
            double[] b = barLine(plot, bars.get(i), i);
            if (b == null) {
                unplaced.add(bars.get(i).label());
                continue;
            }
            placeAt(placed, unplaced, bars.get(i).label(), b[0], b[2], b[1], plot, segments, markerBoxes, lf);
        }
        // the room was reserved for the first pass's list; the list itself is what this pass left
        legend = legend(left, unplaced, plot.getMaxY() + bottom);
        return new Layout(plot, placed, legend, segments, markerBoxes, unplaced);
    }

    /** The bar of a range: [x from, x to, y], stacked up from the bottom of the plot. */
    private double[] barLine(Rectangle2D plot, Bar b, int i) {
        double lo = Math.max(b.fromAmps(), xMin);
        double hi = Math.min(b.toAmps(), xMax);
        if (!(hi > lo)) {
            return null;
        }
        double y = plot.getMaxY() - 5 - 14 * i;
        if (y < plot.getMinY() + 10) {
            return null;
        }
        return new double[] {toX(plot, lo), toX(plot, hi), y};
    }

    private boolean inAxes(double amps, double seconds) {
        return amps >= xMin && amps <= xMax && seconds >= yMin && seconds <= yMax;
    }

    private static Line2D clipped(Rectangle2D plot, double x1, double y1, double x2, double y2) {
        // lines drawn outside the plot are clipped away, and so are the parts labels need not avoid
        double minY = plot.getMinY();
        double maxY = plot.getMaxY();
        if ((y1 < minY && y2 < minY) || (y1 > maxY && y2 > maxY)) {
            return null;
        }
        return new Line2D.Double(x1, Math.max(minY - 1, Math.min(maxY + 1, y1)), x2,
                Math.max(minY - 1, Math.min(maxY + 1, y2)));
    }

    /** Lays the legend out in rows under the plot, wrapping so that no entry leaves the chart. */
    private List<Label> legend(double left, List<String> listed, double top) {
        Font f = tickFont();
        double rowH = bounds("Ag", f).getHeight() + 4;
        List<Label> out = new ArrayList<>();
        double x = left;
        double y = top;
        double right = width - 4;
        for (LegendEntry e : legendEntries) {
            double w = SAMPLE + 4 + bounds(e.text(), f).getWidth();
            if (x + w > right && x > left) {
                x = left;
                y += rowH;
            }
            out.add(new Label(e.text(), new Rectangle2D.Double(x, y, Math.min(w, right - left), rowH - 4)));
            x += w + 14;
        }
        if (!listed.isEmpty()) {
            // one paragraph, wrapped to the chart's width
            if (x > left) {
                y += rowH;
            }
            StringBuilder line = new StringBuilder("Not placed on the plot:");
            for (String s : listed) {
                String candidate = line + " " + s + ";";
                if (bounds(candidate, f).getWidth() > right - left) {
                    out.add(new Label(line.toString(), new Rectangle2D.Double(left, y,
                            bounds(line.toString(), f).getWidth(), rowH - 4)));
                    y += rowH;
                    line = new StringBuilder("  " + s + ";");
                } else {
                    line = new StringBuilder(candidate);
                }
            }
            out.add(new Label(line.toString(), new Rectangle2D.Double(left, y,
                    Math.min(bounds(line.toString(), f).getWidth(), right - left), rowH - 4)));
        }
        return out;
    }

    private boolean free(Rectangle2D box, Rectangle2D plot, List<Label> placed, List<Line2D> segments,
            List<Rectangle2D> markers) {
        Rectangle2D inner = new Rectangle2D.Double(plot.getX() + 1, plot.getY() + 1, plot.getWidth() - 2,
                plot.getHeight() - 2);
        if (!inner.contains(box)) {
            return false;
        }
        Rectangle2D pad = new Rectangle2D.Double(box.getX() - 1.5, box.getY() - 1.5, box.getWidth() + 3,
                box.getHeight() + 3);
        for (Label l : placed) {
            if (l.box().intersects(pad)) {
                return false;
            }
        }
        for (Rectangle2D m : markers) {
            if (m.intersects(pad)) {
                return false;
            }
        }
        for (Line2D s : segments) {
            if (s.intersects(pad)) {
                return false;
            }
        }
        return true;
    }

    /**
     * Places a label near a point: around it at growing distances, or, for a vertical line's label,
     * beside the line at growing depths from the top.
     */
    private void place(List<Label> placed, List<String> unplaced, String text, double amps, double seconds,
            Rectangle2D plot, List<Line2D> segments, List<Rectangle2D> markers, Font f, boolean beside) {
        Rectangle2D size = bounds(text, f);
        double w = size.getWidth();
        double h = size.getHeight();
        double ax = toX(plot, Math.max(xMin, Math.min(xMax, amps)));
        List<double[]> candidates = new ArrayList<>();
        if (beside) {
            for (double dy = 3; dy < plot.getHeight() - h; dy += h / 2) {
                candidates.add(new double[] {ax + 3, plot.getMinY() + dy});
                candidates.add(new double[] {ax - 3 - w, plot.getMinY() + dy});
            }
        } else {
            double ay = toY(plot, Math.max(yMin, Math.min(yMax, seconds)));
            for (double d : new double[] {5, 9, 14, 20, 28, 38, 50, 65}) {
                candidates.add(new double[] {ax + d, ay - d - h});
                candidates.add(new double[] {ax + d, ay + d});
                candidates.add(new double[] {ax - d - w, ay - d - h});
                candidates.add(new double[] {ax - d - w, ay + d});
                candidates.add(new double[] {ax - w / 2, ay - d - h});
                candidates.add(new double[] {ax - w / 2, ay + d});
                candidates.add(new double[] {ax + d, ay - h / 2});
                candidates.add(new double[] {ax - d - w, ay - h / 2});
            }
        }
        for (double[] c : candidates) {
            Rectangle2D box = new Rectangle2D.Double(c[0], c[1], w, h);
            if (free(box, plot, placed, segments, markers)) {
                placed.add(new Label(text, box));
                return;
            }
        }
        unplaced.add(text);
    }

    /** Places a range bar's label above or below the bar, sliding along it, or beside its ends. */
    private void placeAt(List<Label> placed, List<String> unplaced, String text, double x, double y, double x2,
            Rectangle2D plot, List<Line2D> segments, List<Rectangle2D> markers, Font f) {
        Rectangle2D size = bounds(text, f);
        double w = size.getWidth();
        double h = size.getHeight();
        List<double[]> candidates = new ArrayList<>();
        for (double dx = 4; dx + w < x2 - x + 60 && x + dx + w < plot.getMaxX(); dx += 6) {
            candidates.add(new double[] {x + dx, y - 2.5 - h});
            candidates.add(new double[] {x + dx, y + 2.5});
        }
        candidates.add(new double[] {x - 5 - w, y - h / 2});
        candidates.add(new double[] {x2 + 5, y - h / 2});
        for (double[] c : candidates) {
            Rectangle2D box = new Rectangle2D.Double(c[0], c[1], w, h);
            if (free(box, plot, placed, segments, markers)) {
                placed.add(new Label(text, box));
                return;
            }
        }
        unplaced.add(text);
    }

    private double toX(Rectangle2D plot, double amps) {
        return plot.getX() + plot.getWidth() * Math.log(amps / xMin) / Math.log(xMax / xMin);
    }

    private double toY(Rectangle2D plot, double seconds) {
        return plot.getMaxY() - plot.getHeight() * Math.log(seconds / yMin) / Math.log(yMax / yMin);
    }

    // ------------------------------------------------------------------------------------ painting

    /**
     * Paints the chart with its top left corner at the origin, in points.
     *
     * @param g the graphics
     */
    public void paint(Graphics2D g) {
        Rectangle2D plot = layout.plot();
        AffineTransform saved = g.getTransform();
        g.translate(plot.getX(), plot.getY());
        chart.paint(g, (int) plot.getWidth(), (int) plot.getHeight());
        g.setTransform(saved);
        java.awt.Shape clip = g.getClip();
        g.clip(plot);
        paintFaults(g, plot);
        paintBars(g, plot);
        paintMarks(g, plot);
        g.setClip(clip);
        g.setColor(Palette.MARK);
        g.setFont(labelFont());
        for (Label l : layout.labels()) {
            text(g, l, labelFont());
        }
        paintAxes(g, plot);
        paintLegend(g);
    }

    private void paintFaults(Graphics2D g, Rectangle2D plot) {
        g.setColor(Palette.MARK);
        g.setStroke(Palette.dashed(0.8f));
        for (ChartContent.FaultRange f : content.faults()) {
            for (double a : new double[] {f.minAmps(), f.maxAmps()}) {
                if (a >= xMin && a <= xMax) {
                    double px = toX(plot, a);
                    g.draw(new Line2D.Double(px, plot.getMinY(), px, plot.getMaxY()));
                }
            }
        }
    }

    private void paintBars(Graphics2D g, Rectangle2D plot) {
        g.setStroke(new BasicStroke(1.2f));
        for (int i = 0; i < bars.size(); i++) {
            double[] b = barLine(plot, bars.get(i), i);
            if (b == null) {
                continue;
            }
            g.setColor(bars.get(i).colour());
            g.draw(new Line2D.Double(b[0], b[2], b[1], b[2]));
            g.draw(new Line2D.Double(b[0], b[2] - 3, b[0], b[2] + 3));
            g.draw(new Line2D.Double(b[1], b[2] - 3, b[1], b[2] + 3));
        }
    }

    private void paintMarks(Graphics2D g, Rectangle2D plot) {
        for (Mark m : marks) {
            if (!inAxes(m.amps(), m.seconds())) {
                continue;
            }
            double px = toX(plot, m.amps());
            double py = toY(plot, m.seconds());
            if (m.diamond()) {
                Path2D.Double d = new Path2D.Double();
                d.moveTo(px, py - 4);
                d.lineTo(px + 4, py);
                d.lineTo(px, py + 4);
                d.lineTo(px - 4, py);
                d.closePath();
                g.setColor(Palette.MARK);
                g.fill(d);
            } else {
                g.setColor(Palette.FAIL);
                g.setStroke(new BasicStroke(1.3f));
                g.draw(new Line2D.Double(px - 3.5, py - 3.5, px + 3.5, py + 3.5));
                g.draw(new Line2D.Double(px - 3.5, py + 3.5, px + 3.5, py - 3.5));
            }
        }
    }

    private void paintAxes(Graphics2D g, Rectangle2D plot) {
        Font tick = tickFont();
        g.setFont(tick);
        g.setColor(Color.BLACK);
        g.setStroke(new BasicStroke(0.6f));
        double tickH = bounds("0", tick).getHeight();
        for (double a : decades(xMin, xMax)) {
            double px = toX(plot, a);
            g.draw(new Line2D.Double(px, plot.getMaxY(), px, plot.getMaxY() + 3));
            String s = amps(a);
            double w = bounds(s, tick).getWidth();
            float ascent = tick.getLineMetrics(s, FRC).getAscent();
            double x = Math.max(0, Math.min(width - w, px - w / 2));
            g.drawString(s, (float) x, (float) (plot.getMaxY() + 4 + ascent));
        }
        for (double t : decades(yMin, yMax)) {
            double py = toY(plot, t);
            g.draw(new Line2D.Double(plot.getMinX() - 3, py, plot.getMinX(), py));
            String s = seconds(t);
            double w = bounds(s, tick).getWidth();
            float ascent = tick.getLineMetrics(s, FRC).getAscent();
            g.drawString(s, (float) (plot.getMinX() - 5 - w), (float) (py + ascent / 2 - 0.5));
        }
        Font title = titleFont();
        g.setFont(title);
        String xt = currentAxisTitle();
        double xw = bounds(xt, title).getWidth();
        float ta = title.getLineMetrics(xt, FRC).getAscent();
        g.drawString(xt, (float) (plot.getCenterX() - xw / 2), (float) (plot.getMaxY() + 5 + tickH + 3 + ta));
        String yt = "Time (s)";
        double yw = bounds(yt, title).getWidth();
        AffineTransform saved = g.getTransform();
        g.translate(ta + 1, plot.getCenterY() + yw / 2);
        g.rotate(-Math.PI / 2);
        g.drawString(yt, 0f, 0f);
        g.setTransform(saved);
    }

    private void paintLegend(Graphics2D g) {
        Font f = tickFont();
        g.setFont(f);
        int i = 0;
        for (Label l : layout.legend()) {
            Rectangle2D b = l.box();
            float ascent = f.getLineMetrics(l.text(), FRC).getAscent();
            if (i < legendEntries.size()) {
                LegendEntry e = legendEntries.get(i);
                g.setColor(e.colour());
                g.setStroke(e.stroke());
                double y = b.getY() + b.getHeight() / 2;
                g.draw(new Line2D.Double(b.getX(), y, b.getX() + SAMPLE, y));
                g.setColor(Color.BLACK);
                g.drawString(l.text(), (float) (b.getX() + SAMPLE + 4), (float) (b.getY() + ascent));
            } else {
                g.setColor(Palette.MARK);
                g.drawString(l.text(), (float) b.getX(), (float) (b.getY() + ascent));
            }
            i++;
        }
    }

    private static void text(Graphics2D g, Label l, Font f) {
        float ascent = f.getLineMetrics(l.text(), FRC).getAscent();
        g.drawString(l.text(), (float) l.box().getX(), (float) (l.box().getY() + ascent));
    }
}
