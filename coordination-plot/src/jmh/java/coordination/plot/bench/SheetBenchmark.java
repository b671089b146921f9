package coordination.plot.bench;

import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import coordination.plot.sheet.CoordinationSheet;
import coordination.plot.sheet.OutputFormat;
import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

/** Rendering one coordination sheet (the sample motor control centre: four devices, three checks). */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class SheetBenchmark {
    private Study study;
    private StudyReport report;

    /** Reads the study once. */
    @Setup
    public void read() {
        study = StudyReader.read(Path.of("../samples/06-motor-control-centre-grading.yaml"));
        report = StudyReport.evaluate(study);
    }

    /** @return SVG bytes */
    @Benchmark
    public byte[] svg() throws IOException {
        return new CoordinationSheet(study, report).render(OutputFormat.SVG, 150);
    }

    /** @return PNG bytes at 150 dpi */
    @Benchmark
    public byte[] png() throws IOException {
        return new CoordinationSheet(study, report).render(OutputFormat.PNG, 150);
    }

    /** @return PDF bytes */
    @Benchmark
    public byte[] pdf() throws IOException {
        return new CoordinationSheet(study, report).render(OutputFormat.PDF, 150);
    }

    /** @return SVG and PNG of one sheet, as the sheet command writes them */
    @Benchmark
    public int svgAndPng() throws IOException {
        CoordinationSheet sheet = new CoordinationSheet(study, report);
        return sheet.render(OutputFormat.SVG, 150).length + sheet.render(OutputFormat.PNG, 150).length;
    }
}
