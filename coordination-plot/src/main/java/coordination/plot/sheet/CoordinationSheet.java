package coordination.plot.sheet;

import coordination.core.cable.CableThermalLimit;
import coordination.core.margin.CableCheckResult;
import coordination.core.margin.CheckResult;
import coordination.core.margin.GradingCheckResult;
import coordination.core.study.Study;
import coordination.core.study.StudyReport;
import coordination.core.Quantities;
import coordination.plot.chart.ChartContent;
import coordination.plot.chart.Palette;
import coordination.plot.chart.TimeCurrentChart;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.geom.AffineTransform;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

/**
 * A coordination sheet: one landscape page with a title block taken from the study (never from
 * the clock), the time-current chart, the device settings, the cable data, the results of every
 * check and a caution in the footer. A sheet builds its chart once and keeps it for every format,
 * so one sheet is rendered from one thread at a time; separate sheets render in parallel.
 */
public final class CoordinationSheet {
    /** The caution printed on every sheet and in the README. */
    public static final String CAUTION = "Caution: these results support engineering judgement and do not replace"
            + " it. Check them against the local codes that apply and have the study reviewed by a qualified,"
            + " licensed engineer before relying on it.";

    /** What the checks leave out, printed before the caution. */
    public static final String SCOPE = "Scope: each check covers its stated fault-current range only; overload"
            + " protection of the cables (currents below the ranges) is not part of these checks.";

    /** Line height of the notes, in points. */
    private static final double NOTE_LINE = 7.2;
    /** Font size of the notes. */
    private static final float NOTE_FONT = 6.2f;
    /** Most lines of notes on a sheet; the rest are counted and stay in the report. */
    private static final int MAX_NOTE_LINES = 18;
    private static final double MM_TO_PT = 72.0 / 25.4;
    private static final double MARGIN = 22;

    private final Study study;
    private final StudyReport report;
    private final double width;
    private final double height;
    private TimeCurrentChart chart;

    /**
     * Creates the sheet of an evaluated study.
     *
     * @param study the study
     * @param report its report
     */
    public CoordinationSheet(Study study, StudyReport report) {
        this.study = study;
        this.report = report;
        this.width = Math.round(study.page().widthMm() * MM_TO_PT);
        this.height = Math.round(study.page().heightMm() * MM_TO_PT);
    }

    /** @return page width in points */
    public double widthPoints() {
        return width;
    }

    /** @return page height in points */
    public double heightPoints() {
        return height;
    }

    /**
     * Renders the sheet.
     *
     * @param format file format
     * @param dpi PNG resolution in dots per inch
     * @return the file's bytes
     * @throws IOException if encoding fails
     */
    public byte[] render(OutputFormat format, int dpi) throws IOException {
        return Drawing.render(format, width, height, dpi, this::paint, new Drawing.Info(study.title(),
                "Coordination sheet of study " + study.name() + (study.revision().isEmpty() ? ""
                : ", revision " + study.revision()), studyDate()));
    }

    /**
     * Paints the sheet on a Graphics2D whose unit is one point.
     *
     * @param g the graphics
     */
    public void paint(Graphics2D g) {
        g.setColor(Color.WHITE);
        g.fill(new Rectangle2D.Double(0, 0, width, height));
        g.setColor(Palette.MARK);
        g.setStroke(new BasicStroke(0.8f));
        g.draw(new Rectangle2D.Double(MARGIN / 2, MARGIN / 2, width - MARGIN, height - MARGIN));
        double top = titleBlock(g);
        double footerTop = height - MARGIN - 30;
        double chartW = Math.round((width - 2 * MARGIN) * 0.58);
        int rows = study.network().map(n -> n.accepted().size()).orElse(0);
        for (CheckResult o : report.results()) {
            rows += o.pass() ? 1 : 2;
        }
        double resultsH = Math.min(140, 28 + 10 * Math.max(1, rows));
        List<String> notes = noteLines(g, notes(), width - 2 * MARGIN, MAX_NOTE_LINES);
        double notesH = notes.isEmpty() ? 0 : 16 + NOTE_LINE * notes.size();
        double notesTop = footerTop - notesH;
        double chartBottom = notesTop - resultsH - 6;
        double chartH = chartBottom - top - 4;
        chart(g, MARGIN, top + 4, chartW, chartH);
        double rightX = MARGIN + chartW + 12;
        double rightW = width - MARGIN - rightX;
        settingsColumn(g, rightX, top + 4, rightW, chartBottom);
        resultsTable(g, MARGIN, chartBottom + 4, width - 2 * MARGIN, notesTop - 4);
        if (!notes.isEmpty()) {
            notesTable(g, notes, MARGIN, notesTop, width - 2 * MARGIN);
        }
        footer(g, footerTop);
    }

    /** The study's date, if it is an ISO date (the study keeps the text as written). */
    private java.util.Optional<java.time.LocalDate> studyDate() {
        try {
            return study.date().isEmpty() ? java.util.Optional.empty()
                    : java.util.Optional.of(java.time.LocalDate.parse(study.date()));
        } catch (java.time.format.DateTimeParseException e) {
            return java.util.Optional.empty();
        }
    }

    private double titleBlock(Graphics2D g) {
        double x = MARGIN;
        double y = MARGIN;
        g.setColor(Color.BLACK);
        g.setFont(Palette.font(Font.BOLD, 13f));
        text(g, fit(g, study.title(), width - 2 * MARGIN - 150), x, y + 12);
        g.setFont(Palette.font(Font.PLAIN, 8f));
        List<String> facts = new ArrayList<>();
        facts.add("reference " + Quantities.asGiven(study.voltageKv()) + " kV");
        facts.add(Quantities.asGiven(study.frequencyHz()) + " Hz");
        if (!study.revision().isEmpty()) {
            facts.add("revision " + study.revision());
        }
        if (!study.date().isEmpty()) {
            facts.add("dated " + study.date());
        }
        facts.add("study " + study.name());
        text(g, String.join("   ·   ", facts), x, y + 25);
        signOff(g, x, y + 38);
        // verdict box, worded as well as coloured
        boolean pass = report.pass();
        int fails = report.failures();
        int n = report.results().size();
        String verdict = n == 0 ? "NO CHECKS" : pass ? (n == 1 ? "THE CHECK PASSES" : "ALL " + n + " CHECKS PASS")
                : fails + " OF " + n + (n == 1 ? " CHECK FAILS" : " CHECKS FAIL");
        g.setFont(Palette.font(Font.BOLD, 10f));
        FontMetrics fm = g.getFontMetrics();
        double bw = fm.stringWidth(verdict) + 16;
        double bx = width - MARGIN - bw;
        g.setColor(pass ? Palette.PASS : Palette.FAIL);
        g.setStroke(new BasicStroke(1.4f));
        g.draw(new Rectangle2D.Double(bx, y, bw, 22));
        text(g, verdict, bx + 8, y + 15);
        g.setColor(Palette.MARK);
        g.setStroke(new BasicStroke(0.6f));
        g.draw(new Line2D.Double(MARGIN, y + 43, width - MARGIN, y + 43));
        return y + 45;
    }

    /** Drawing number and signatures: the names the study gives, or a line to write on. */
    private void signOff(Graphics2D g, double x, double y) {
        Study.SignOff s = study.signOff();
        String[][] fields = {{"drawing", s.drawing()}, {"prepared", s.prepared()}, {"checked", s.checked()},
            {"approved", s.approved()}};
        g.setFont(Palette.font(Font.PLAIN, 8f));
        FontMetrics fm = g.getFontMetrics();
        double cx = x;
        for (String[] f : fields) {
            g.setColor(Palette.MARK);
            text(g, f[0], cx, y);
            cx += fm.stringWidth(f[0]) + 4;
            g.setColor(Color.BLACK);
            double w = Math.max(90, fm.stringWidth(f[1]) + 6);
            if (f[1].isEmpty()) {
                g.setStroke(new BasicStroke(0.5f));
                g.draw(new Line2D.Double(cx, y + 1.5, cx + w, y + 1.5));
            } else {
                text(g, f[1], cx, y);
            }
            cx += w + 14;
        }
    }

    private void chart(Graphics2D g, double x, double y, double w, double h) {
        // built once and painted for every format; painting does not change it
        if (chart == null) {
            chart = new TimeCurrentChart(ChartContent.of(study, report), (int) w, (int) h);
        }
        TimeCurrentChart tcc = chart;
        AffineTransform saved = g.getTransform();
        g.translate(x, y);
        tcc.paint(g);
        g.setTransform(saved);
    }

    private double heading(Graphics2D g, String title, double x, double y, double w) {
        g.setColor(Color.BLACK);
        g.setFont(Palette.font(Font.BOLD, 8.5f));
        text(g, title, x, y + 9);
        g.setColor(Palette.MARK);
        g.setStroke(new BasicStroke(0.5f));
        g.draw(new Line2D.Double(x, y + 12, x + w, y + 12));
        return y + 14;
    }

    /** A block of the settings column: a device (with its line sample) or a cable, or a heading. */
    private record Block(List<String> lines, int device, boolean heading) {
    }

    private List<String> cableLines(Study.StudyCable c) {
        CableThermalLimit l = c.limit();
        return List.of(l.id(),
                l.material().key() + ", " + l.insulation().key() + ", " + (l.parallel() > 1 ? l.parallel() + " x " : "")
                    + c.sizeText() + ", " + l.method().key(),
                "k " + Quantities.significant(l.k(), 3) + ", " + initial(c) + " to "
                    + Quantities.asGiven(l.finalCelsius()) + " °C" + (c.finalSource()
                    == Study.TemperatureSource.INSULATION_DEFAULT ? " (default)" : ""),
                "I²t " + engineering(l.i2tA2s()) + "A²s" + c.fault().map(f -> ", faults "
                    + kiloamps(f.fromAmps()) + " to " + kiloamps(f.toAmps()) + " kA").orElse(""),
                "withstand " + kiloamps(l.withstandAmps(0.1)) + " / " + kiloamps(l.withstandAmps(1.0)) + " / "
                    + kiloamps(l.withstandAmps(5.0)) + " kA at 0.1 / 1 / 5 s");
    }

    /**
     * The devices with their settings, then the cables: in one column at 7 pt where they fit,
     * else flowing through two narrower columns at 6.3 pt.
     */
    private void settingsColumn(Graphics2D g, double x, double y, double w, double bottom) {
        double cy = heading(g, "Devices and settings", x, y, w);
        // how to read the curves, so that a relay's thin operating line is not taken for another device
        g.setFont(Palette.font(Font.PLAIN, 6.5f));
        g.setColor(Palette.MARK);
        String[] key = {
            "Thick line: clearing time (a relay's with its breaker). Thin line: a relay's operating time.",
            "Band: a fuse from melting to clearing, a breaker's tolerance, a relay's operating spread.",
            "Cable: solid from 0.1 s to 5 s (the adiabatic window), dashed outside it; grey: damage zone.",
            "Diamond: least margin of a cable check. Cross: a crossing of the curves.",
        };
        for (String k : key) {
            text(g, fit(g, k, w), x, cy + 7);
            cy += 8;
        }
        cy += 3;
        List<Block> blocks = new ArrayList<>();
        int lineCount = 0;
        int index = 0;
        for (Study.StudyDevice d : study.devices()) {
            List<String> lines = new ArrayList<>();
            lines.add(SettingsText.heading(d));
            lines.addAll(SettingsText.lines(d));
            blocks.add(new Block(lines, index++, false));
            lineCount += lines.size();
        }
        if (!study.cables().isEmpty()) {
            blocks.add(new Block(List.of("Cables"), -1, true));
            lineCount += 2;
            for (Study.StudyCable c : study.cables()) {
                blocks.add(new Block(cableLines(c), -1, false));
                lineCount += 5;
            }
        }
        if (study.network().isPresent()) {
            blocks.add(new Block(List.of("Fault levels (IEC 60909-0)"), -1, true));
            lineCount += 2;
            var net = study.network().get();
            for (var bus : net.network().buses()) {
                var f = net.levels().at(bus.id()).orElseThrow();
                blocks.add(new Block(List.of(bus.id() + " at " + Quantities.asGiven(bus.voltageKv()) + " kV",
                        "Ik3 max " + Quantities.current(f.ik3MaxAmps(), 3) + ", Ik3 min "
                                + Quantities.current(f.ik3MinAmps(), 3) + ", Ik2 min "
                                + Quantities.current(f.ik2MinAmps(), 3),
                        "κ " + Quantities.significant(f.kappa(), 3) + ", ip " + Quantities.current(f.ipAmps(), 3)),
                        -2, false));
                lineCount += 3;
            }
        }
        boolean two = cy + 9 * lineCount + 2 * blocks.size() > bottom;
        double line = two ? 7.6 : 9;
        float size = two ? 6.3f : 7f;
        double colW = two ? (w - 8) / 2 : w;
        double top = cy;
        double colX = x;
        int column = 0;
        int shownDevices = 0;
        int shownCables = 0;
        for (Block b : blocks) {
            double need = b.heading() ? line + 6 : line * b.lines().size() + 2;
            if (cy + need > bottom) {
                if (!two || column == 1) {
                    break;
                }
                column = 1;
                colX = x + colW + 8;
                cy = top;
            }
            if (b.heading()) {
                cy = heading(g, b.lines().get(0), colX, cy + 4, colW) - 2;
                continue;
            }
            boolean isDevice = b.device() >= 0;
            boolean isLevel = b.device() == -2;
            double indent = isDevice ? 16 : 0;
            if (isDevice) {
                g.setColor(Palette.device(b.device()));
                g.setStroke(Palette.deviceStroke(b.device(), 1.6f));
                g.draw(new Line2D.Double(colX, cy + line / 2 + 0.5, colX + 12, cy + line / 2 + 0.5));
            }
            g.setColor(Color.BLACK);
            g.setFont(Palette.font(Font.BOLD, size));
            text(g, fit(g, b.lines().get(0), colW - indent), colX + indent, cy + line - 1.5);
            g.setFont(Palette.font(Font.PLAIN, size));
            cy += line;
            double sub = isDevice ? indent : 8;
            for (int i = 1; i < b.lines().size(); i++) {
                text(g, fit(g, b.lines().get(i), colW - sub), colX + sub, cy + line - 1.5);
                cy += line;
            }
            cy += 2;
            if (isDevice) {
                shownDevices++;
            } else if (!isLevel) {
                shownCables++;
            }
        }
        int missing = study.devices().size() - shownDevices + study.cables().size() - shownCables;
        if (missing > 0) {
            g.setColor(Color.BLACK);
            g.setFont(Palette.font(Font.PLAIN, size));
            text(g, "+ " + missing + " more devices or cables in the report", colX, Math.min(cy, bottom - 2) + line
                    - 1.5);
        }
    }

    /** The initial temperature as the study gives it, or computed from the load to three figures. */
    static String initial(Study.StudyCable c) {
        double t = c.limit().initialCelsius();
        return switch (c.initialSource()) {
            case STATED -> Quantities.asGiven(t) + " °C";
            case FROM_LOAD -> Quantities.significant(t, 3) + " °C (from the load)";
            case INSULATION_DEFAULT -> Quantities.asGiven(t) + " °C (default)";
        };
    }

    private void resultsTable(Graphics2D g, double x, double y, double w, double bottom) {
        double cy = heading(g, "Checks", x, y, w);
        double[] col = {x, x + w * 0.25, x + w * 0.38, x + w * 0.45, x + w * 0.55, x + w * 0.62, x + w * 0.77,
            x + w * 0.90};
        String[] head = {"check", "least margin / interval", "at", "least ratio", "at", "crossings", "required",
            "verdict"};
        g.setFont(Palette.font(Font.BOLD, 7f));
        g.setColor(Palette.MARK);
        for (int i = 0; i < head.length; i++) {
            double cw = (i + 1 < col.length ? col[i + 1] : x + w) - col[i] - 4;
            text(g, fit(g, head[i], cw), col[i], cy + 7.5);
        }
        cy += 10;
        int shown = 0;
        for (int index = 0; index < report.results().size(); index++) {
            CheckResult o = report.results().get(index);
            int rows = o.pass() ? 1 : 2;
            if (cy + 10 * rows > bottom) {
                break;
            }
            String[] cells = cells(o);
            if (report.study().checks().get(index) instanceof Study.GradingCheckSpec spec
                    && !spec.faultCase().isEmpty()) {
                cells[0] = cells[0] + " (" + spec.faultCase() + ")";
            } else if (report.study().checks().get(index) instanceof Study.CableCheckSpec spec
                    && !spec.faultCase().isEmpty()) {
                cells[0] = cells[0] + " (one of its parallel conductors)";
            }
            boolean pass = o.pass();
            g.setFont(Palette.font(Font.PLAIN, 7f));
            for (int i = 0; i < cells.length; i++) {
                g.setColor(i == cells.length - 1 ? (pass ? Palette.PASS : Palette.FAIL) : Color.BLACK);
                if (i == cells.length - 1) {
                    g.setFont(Palette.font(Font.BOLD, 7f));
                }
                double cw = (i + 1 < col.length ? col[i + 1] : x + w) - col[i] - 4;
                text(g, fit(g, cells[i], cw), col[i], cy + 7.5);
            }
            cy += 10;
            if (!pass) {
                // a failing check says why, as the check command does
                g.setFont(Palette.font(Font.PLAIN, 7f));
                g.setColor(Palette.FAIL);
                text(g, fit(g, "why: " + o.reason(), w - (col[1] - x)), col[1], cy + 7.5);
                cy += 10;
            }
            shown++;
        }
        if (shown < report.results().size()) {
            g.setColor(Color.BLACK);
            text(g, "+ " + (report.results().size() - shown) + " more checks in the report", x, cy + 7.5);
            cy += 10;
        }
        for (Study.Accepted a : study.network().map(Study.StudyNetwork::accepted).orElse(List.of())) {
            if (cy + 10 > bottom) {
                break;
            }
            g.setFont(Palette.font(Font.PLAIN, 7f));
            g.setColor(Color.BLACK);
            text(g, fit(g, a.downstream() + " under " + a.upstream(), col[1] - x - 4), x, cy + 7.5);
            g.setColor(Palette.MARK);
            text(g, fit(g, "accepted, not selective: " + a.reason(), w - (col[1] - x)), col[1], cy + 7.5);
            cy += 10;
        }
    }

    private static String[] cells(CheckResult o) {
        String verdict = o.pass() ? "pass" : "FAIL";
        if (o instanceof CableCheckResult r) {
            boolean margin = Double.isFinite(r.minMarginSeconds());
            boolean ratio = Double.isFinite(r.minRatio());
            return new String[] {r.device() + " protects " + r.cable(),
                margin ? seconds(r.minMarginSeconds()) + " s" : "none",
                margin ? Quantities.current(r.minMarginAtAmps(), 3) : "",
                ratio ? Quantities.significant(r.minRatio(), 3) : "none",
                ratio ? Quantities.current(r.minRatioAtAmps(), 3) : "",
                crossings(r.crossingsAmps()), r.requirement().toString(), verdict};
        }
        if (o instanceof GradingCheckResult r) {
            boolean interval = Double.isFinite(r.minIntervalSeconds());
            boolean energy = Double.isFinite(r.minEnergyRatio());
            return new String[] {r.downstream() + " grades under " + r.upstream(),
                interval ? seconds(r.minIntervalSeconds()) + " s" : "none",
                interval ? Quantities.current(r.minIntervalAtAmps(), 3) : "",
                energy ? Quantities.significant(r.minEnergyRatio(), 3) + " (I²t)" : Double.isFinite(r.ratingRatio())
                    ? Quantities.significant(r.ratingRatio(), 3) + " (rating)" : "",
                energy ? Quantities.current(r.minEnergyRatioAtAmps(), 3) : "",
                crossings(r.crossingsAmps()), r.requirement().toString(), verdict};
        }
        throw new IllegalStateException("no table row for a result of kind " + o.getClass().getSimpleName());
    }

    /**
     * Every assumption and warning of the report, each once, assumptions first; notes that say the
     * same of several devices or cables are said once, naming them all.
     */
    private List<String> notes() {
        java.util.LinkedHashSet<String> out = new java.util.LinkedHashSet<>();
        for (StudyReport.CheckNotes n : report.notes()) {
            n.assumptions().forEach(a -> out.add("assumed: " + a.message()));
        }
        for (StudyReport.CheckNotes n : report.notes()) {
            n.warnings().forEach(w -> out.add("warning: " + w.message()));
        }
        report.warnings().forEach(w -> out.add("warning: " + w.message()));
        java.util.LinkedHashMap<String, List<String>> subjects = new java.util.LinkedHashMap<>();
        List<String> merged = new ArrayList<>();
        java.util.regex.Pattern subject = java.util.regex.Pattern.compile("^(assumed|warning): (\\w+) '([^']+)': (.*)$");
        for (String n : out) {
            java.util.regex.Matcher m = subject.matcher(n);
            if (m.matches()) {
                String key = m.group(1) + "\u0000" + m.group(2) + "\u0000" + m.group(4);
                if (!subjects.containsKey(key)) {
                    merged.add(key);
                }
                subjects.computeIfAbsent(key, k -> new ArrayList<>()).add("'" + m.group(3) + "'");
            } else {
                merged.add(n);
            }
        }
        List<String> result = new ArrayList<>();
        for (String n : merged) {
            List<String> who = subjects.get(n);
            if (who == null) {
                result.add(n);
            } else {
                String[] p = n.split("\u0000", 3);
                result.add(p[0] + ": " + p[1] + (who.size() > 1 ? "s " : " ") + String.join(", ", who) + ": " + p[2]);
            }
        }
        return result;
    }

    /** The notes wrapped to the page width, with the lines that do not fit counted in a last line. */
    private List<String> noteLines(Graphics2D g, List<String> notes, double w, int maxLines) {
        g.setFont(Palette.font(Font.PLAIN, NOTE_FONT));
        List<String> lines = new ArrayList<>();
        int shown = 0;
        for (String n : notes) {
            List<String> wrapped = wrap(g, n, w);
            if (lines.size() + wrapped.size() > maxLines - (shown + 1 < notes.size() ? 1 : 0)) {
                lines.add("+ " + (notes.size() - shown) + " more in the report");
                return lines;
            }
            for (int i = 0; i < wrapped.size(); i++) {
                lines.add((i == 0 ? "" : "    ") + wrapped.get(i));
            }
            shown++;
        }
        return lines;
    }

    private void notesTable(Graphics2D g, List<String> lines, double x, double y, double w) {
        double cy = heading(g, "What the results rest on", x, y, w);
        g.setFont(Palette.font(Font.PLAIN, NOTE_FONT));
        boolean warning = false;
        for (String line : lines) {
            if (!line.startsWith("    ")) {
                warning = line.startsWith("warning");
            }
            g.setColor(warning ? Palette.FAIL : Color.BLACK);
            text(g, line, x, cy + 6);
            cy += NOTE_LINE;
        }
    }

    private void footer(Graphics2D g, double y) {
        g.setColor(Palette.MARK);
        g.setStroke(new BasicStroke(0.5f));
        g.draw(new Line2D.Double(MARGIN, y, width - MARGIN, y));
        g.setFont(Palette.font(Font.PLAIN, 6.8f));
        g.setColor(Color.BLACK);
        List<String> lines = new ArrayList<>(wrap(g, SCOPE, width - 2 * MARGIN));
        lines.addAll(wrap(g, CAUTION, width - 2 * MARGIN));
        double ly = y + 8;
        for (String l : lines) {
            text(g, l, MARGIN, ly);
            ly += 8;
        }
    }

    private static String crossings(double[] amps) {
        if (amps.length == 0) {
            return "none";
        }
        List<String> s = new ArrayList<>();
        for (double a : amps) {
            s.add(Quantities.current(a, 3));
        }
        return String.join(", ", s);
    }

    private static String seconds(double s) {
        return Quantities.significant(s, 3);
    }

    private static String kiloamps(double amps) {
        return Quantities.kiloamps(amps, 3);
    }

    private static String engineering(double v) {
        double e = Math.floor(Math.log10(v));
        return Quantities.significant(v / Math.pow(10, e), 3) + "e" + (int) e + " ";
    }

    private static void text(Graphics2D g, String s, double x, double y) {
        g.drawString(s, (float) x, (float) y);
    }

    private static String fit(Graphics2D g, String s, double w) {
        FontMetrics fm = g.getFontMetrics();
        if (fm.stringWidth(s) <= w) {
            return s;
        }
        String t = s;
        while (t.length() > 1 && fm.stringWidth(t + "…") > w) {
            t = t.substring(0, t.length() - 1);
        }
        return t + "…";
    }

    private static List<String> wrap(Graphics2D g, String s, double w) {
        FontMetrics fm = g.getFontMetrics();
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : s.split(" ")) {
            String candidate = line.length() == 0 ? word : line + " " + word;
            if (fm.stringWidth(candidate) > w && line.length() > 0) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        if (line.length() > 0) {
            lines.add(line.toString());
        }
        return lines;
    }
}
