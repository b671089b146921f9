package coordination.plot.cli;

import coordination.core.study.Problem;
import coordination.core.study.StudyReport;
import coordination.plot.sheet.OutputFormat;
import coordination.plot.sheet.SheetWriter;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code coordination sheet}: coordination sheets and reports for study files. */
@Command(name = "sheet", mixinStandardHelpOptions = true,
        description = "Writes a coordination sheet and NAME.report.json for each study file. A folder means"
                + " every *.yaml in it; folders are processed in parallel on all cores.")
final class SheetCommand implements Callable<Integer> {
    private final PrintStream out;
    private final PrintStream err;

    @Parameters(arity = "1..*", paramLabel = "STUDY", description = "study files or folders of them")
    List<Path> inputs;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "OUTDIR", description = "output folder")
    Path output;

    @Option(names = "--format", split = ",", paramLabel = "FORMAT", description = "svg, png, pdf (default: svg,png)")
    List<String> formats = List.of("svg", "png");

    @Option(names = "--dpi", paramLabel = "DPI", description = "PNG resolution, 72 to 600 (default: 150)")
    int dpi = 150;

    @Option(names = "--threads", paramLabel = "N", description = "worker threads (default: all cores)")
    int threads = Runtime.getRuntime().availableProcessors();

    SheetCommand(PrintStream out, PrintStream err) {
        this.out = out;
        this.err = err;
    }

    private record Outcome(Path file, List<Problem> problems, boolean pass, String error, int written) {
    }

    @Override
    public Integer call() throws Exception {
        Set<OutputFormat> chosen = EnumSet.noneOf(OutputFormat.class);
        for (String f : formats) {
            try {
                chosen.add(OutputFormat.parse(f));
            } catch (IllegalArgumentException e) {
                err.println("coordination sheet: --" + e.getMessage());
                return ExitCodes.BAD_INPUT;
            }
        }
        if (dpi < 72 || dpi > 600) {
            err.println("coordination sheet: --dpi: found " + dpi + " - must be from 72 to 600");
            return ExitCodes.BAD_INPUT;
        }
        List<Path> files = StudyInputs.collect(inputs, err);
        if (files == null) {
            return ExitCodes.BAD_INPUT;
        }
        if (files.isEmpty()) {
            err.println("coordination sheet: no study files (*.yaml) in " + inputs);
            return ExitCodes.BAD_INPUT;
        }
        Map<String, Path> names = new HashMap<>();
        for (Path f : files) {
            String base = SheetWriter.safeName(StudyInputs.baseName(f));
            Path other = names.putIfAbsent(base, f);
            if (other != null) {
                err.println(f + ": writes the same sheet name '" + base + "' as " + other
                        + " - rename one of them or run them into different folders");
                return ExitCodes.BAD_INPUT;
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(threads, files.size())));
        List<Future<Outcome>> futures = new ArrayList<>();
        for (Path f : files) {
            futures.add(pool.submit(() -> process(f, chosen)));
        }
        Progress progress = new Progress(out, files.size());
        List<Outcome> outcomes = new ArrayList<>();
        try {
            for (Future<Outcome> fu : futures) {
                outcomes.add(fu.get());
                progress.step();
            }
        } catch (ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
            progress.done();
        }
        int invalid = 0;
        int failed = 0;
        int written = 0;
        for (Outcome o : outcomes) {
            for (Problem p : o.problems()) {
                err.println(p);
            }
            if (o.error() != null) {
                err.println(o.file() + ": " + o.error());
            }
            if (!o.problems().isEmpty() || o.error() != null) {
                invalid++;
            } else if (!o.pass()) {
                failed++;
            }
            written += o.written();
        }
        int ok = outcomes.size() - invalid - failed;
        out.println("sheets: " + outcomes.size() + " studies, " + ok + " pass, " + failed + " fail, " + invalid
                + " not read; " + written + " files in " + output);
        return invalid > 0 ? ExitCodes.BAD_INPUT : failed > 0 ? ExitCodes.CHECK_FAILED : ExitCodes.PASS;
    }

    private Outcome process(Path file, Set<OutputFormat> chosen) {
        StudyInputs.Loaded l = StudyInputs.load(file);
        if (l.study() == null) {
            return new Outcome(file, l.problems(), false, null, 0);
        }
        StudyReport report = StudyReport.evaluate(l.study());
        try {
            Map<String, byte[]> files = SheetWriter.render(l.study(), report, chosen, dpi);
            SheetWriter.write(output, files);
            return new Outcome(file, List.of(), report.pass(), null, files.size());
        } catch (IOException e) {
            return new Outcome(file, List.of(), false, "cannot write to " + output + ": " + e.getMessage(), 0);
        }
    }

    /** A one-line progress bar, drawn only when standard output is a terminal. */
    private static final class Progress {
        private final PrintStream out;
        private final int total;
        private final boolean terminal;
        private int done;

        Progress(PrintStream out, int total) {
            this.out = out;
            this.total = total;
            this.terminal = System.console() != null && out != null && total > 1 && System.getenv("CI") == null;
        }

        void step() {
            done++;
            if (terminal) {
                int width = 30;
                int filled = done * width / total;
                out.print("\r[" + "#".repeat(filled) + " ".repeat(width - filled) + "] " + done + "/" + total);
                out.flush();
            }
        }

        void done() {
            if (terminal) {
                out.print("\r" + " ".repeat(50) + "\r");
                out.flush();
            }
        }
    }
}
