package coordination.core.bench;

import coordination.core.study.Study;
import coordination.core.study.StudyReader;
import coordination.core.study.StudyReport;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * A 200-bus radial network ({@code samples/large/network-200.yaml}): a transformer and 198 cables
 * in ten feeders of branching sub-distribution, each cable behind its own relay; reading it
 * computes the fault levels and derives the checks, evaluating runs them all.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class NetworkBenchmark {
    private final String text = read();
    private final Study study = StudyReader.parse("net.yaml", "net", text);

    private static String read() {
        try {
            // the module's folder is the working directory under exec:exec
            return Files.readString(Path.of("../samples/large/network-200.yaml"));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** @return the study: fault levels computed and checks derived */
    @Benchmark
    public Study readAndDerive() {
        return StudyReader.parse("net.yaml", "net", text);
    }

    /** @return every derived check run */
    @Benchmark
    public StudyReport readDeriveAndRun() {
        return StudyReport.evaluate(StudyReader.parse("net.yaml", "net", text));
    }

    /** @return the checks run on a study already read */
    @Benchmark
    public StudyReport runOnly() {
        return StudyReport.evaluate(study);
    }
}
