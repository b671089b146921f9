package coordination.plot.chart;

import static org.hamcrest.MatcherAssert.assertThat;
import static org.hamcrest.Matchers.empty;
import static org.hamcrest.Matchers.is;

import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/** Labels touch no line, marker or other label and stay in the plot; the legend stays on the chart. */
class ChartLayoutTest {
    private static final Path CROWDED = Path.of("src/test/resources/layout/eight-devices-three-cables.yaml");

    static Stream<Path> studies() throws Exception {
        List<Path> all = new ArrayList<>(Files.list(Path.of("../samples"))
                .filter(p -> p.toString().endsWith(".yaml")).sorted().toList());
        all.add(CROWDED);
        return all.stream();
    }

    private static TimeCurrentChart chart(Path file, int w, int h) {
        Study s = StudyReader.read(file);
        return new TimeCurrentChart(ChartContent.of(s, StudyReport.evaluate(s)), w, h);
    }

    private static List<String> problems(TimeCurrentChart c, int w, int h) {
        TimeCurrentChart.Layout l = c.layout();
        List<String> out = new ArrayList<>();
        Rectangle2D page = new Rectangle2D.Double(0, 0, w, h);
        for (TimeCurrentChart.Label e : l.legend()) {
            if (!page.contains(e.box())) {
                out.add("legend entry '" + e.text() + "' at " + e.box() + " leaves the chart " + page);
            }
        }
        List<TimeCurrentChart.Label> labels = l.labels();
        for (int i = 0; i < labels.size(); i++) {
            Rectangle2D b = labels.get(i).box();
            if (!l.plot().contains(b)) {
                out.add("label '" + labels.get(i).text() + "' leaves the plot");
            }
            for (int j = i + 1; j < labels.size(); j++) {
                if (b.intersects(labels.get(j).box())) {
                    out.add("labels '" + labels.get(i).text() + "' and '" + labels.get(j).text() + "' overlap");
                }
            }
            for (Line2D s : l.lines()) {
                if (s.intersects(b)) {
                    out.add("label '" + labels.get(i).text() + "' crosses a line from " + s.getP1() + " to " + s.getP2());
                    break;
                }
            }
            for (Rectangle2D m : l.markers()) {
                if (m.intersects(b)) {
                    out.add("label '" + labels.get(i).text() + "' covers a marker");
                }
            }
        }
        return out;
    }

    @ParameterizedTest
    @MethodSource("studies")
    void labelsAndLegendKeepClearAtTheSheetsSize(Path file) {
        // the chart's size on an A4 sheet, and a smaller one
        for (int[] size : new int[][] {{463, 330}, {360, 260}}) {
            TimeCurrentChart c = chart(file, size[0], size[1]);
            assertThat(file + " at " + size[0] + " x " + size[1], problems(c, size[0], size[1]), empty());
        }
    }

    @Test
    void aCrowdedChartStillPlacesItsFaultCurrentLabels() {
        TimeCurrentChart c = chart(CROWDED, 463, 330);
        long placed = c.layout().labels().stream().filter(l -> l.text().startsWith("Ik ")).count();
        long listed = c.layout().unplaced().stream().filter(t -> t.startsWith("Ik ")).count();
        // three cables, each with a lowest and a highest fault current: every one is on the chart
        assertThat(placed + listed, is(6L));
        assertThat("legend entries for 8 devices, 2 let-through energies and 3 cables",
                c.layout().legend().size() >= 13, is(true));
    }
}
