package coordination.plot.cli;

import coordination.core.study.Problem;
import coordination.core.study.TextRules;
import coordination.core.study.StudyReport;
import coordination.plot.sheet.OutputFormat;
import coordination.plot.sheet.SheetWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Set;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code coordination sheet}: coordination sheets and reports for study files. */
@Command(name = "sheet", mixinStandardHelpOptions = true,
        description = "Writes a coordination sheet and NAME.report.json for each study file. A folder means"
                + " every *.yaml in it; folders are processed in parallel on all cores.")
final class SheetCommand implements Callable<Integer> {
    private final InputStream in;
    private final PrintStream out;
    private final PrintStream err;

    @Parameters(arity = "1..*", paramLabel = "STUDY", description = "study files or folders of them; - reads one"
            + " study from standard input")
    List<Path> inputs;

    @Option(names = {"-o", "--output"}, required = true, paramLabel = "OUTDIR", description = "output folder")
    Path output;

    @Option(names = "--format", split = ",", paramLabel = "FORMAT", completionCandidates = Formats.class,
            description = "${COMPLETION-CANDIDATES}, comma-separated (default: svg)")
    List<String> formats = List.of("svg");

    @Option(names = "--dpi", paramLabel = "DPI", description = "PNG resolution, 72 to 600 (default: 150; 300 for print)")
    int dpi = 150;

    @Option(names = "--threads", paramLabel = "N", description = "worker threads (default: all cores)")
    int threads = Runtime.getRuntime().availableProcessors();

    @Mixin
    StudySelection selection = new StudySelection();

    @Option(names = "--incremental", description = "draw only the studies that changed since the last"
            + " --incremental run into this folder: a digest of each study, the formats, the resolution and the tool"
            + " is kept in OUTDIR/" + OutputCache.FILE)
    boolean incremental;

    @Option(names = {"-q", "--quiet"}, description = "no progress bar and no summary; errors still go to standard"
            + " error, and the exit code tells the verdict")
    boolean quiet;

    /** The sheet formats, for help and completion. */
    static final class Formats implements Iterable<String> {
        @Override
        public java.util.Iterator<String> iterator() {
            return java.util.Arrays.stream(OutputFormat.values()).map(f -> f.name().toLowerCase(java.util.Locale.ROOT))
                    .iterator();
        }
    }

    SheetCommand(InputStream in, PrintStream out, PrintStream err) {
        this.in = in;
        this.out = out;
        this.err = err;
    }

    /** What became of one study. */
    private enum Verdict {
        PASS("pass"), FAIL("failing"), NOT_READ("not read"), INTERNAL_ERROR("internal error");

        private final String word;

        Verdict(String word) {
            this.word = word;
        }
    }

    /**
     * What became of one study: its verdict, errors and files, and for the cache whether it was
     * left as it was and the digest of its inputs.
     */
    private record Outcome(Path file, List<Problem> problems, Verdict verdict, String error, List<String> written,
            boolean unchanged, String digest) {
        Outcome(Path file, List<Problem> problems, Verdict verdict, String error) {
            this(file, problems, verdict, error, List.of(), false, null);
        }
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
        List<Path> files = selection.files(inputs, "sheet", err);
        if (files == null) {
            return ExitCodes.BAD_INPUT;
        }
        if (files.size() == 1 && !incremental) {
            SheetWarmUp.start(chosen);
        }
        // every output name, and the study that writes it: two studies writing one name, or a study
        // writing over one of the inputs, are refused; the others go ahead
        Map<String, Path> owner = new HashMap<>();
        Map<Path, String> refused = new HashMap<>();
        Set<Path> inputs = new java.util.HashSet<>();
        for (Path f : files) {
            inputs.add(f.toAbsolutePath().normalize());
        }
        Path target = output.toAbsolutePath().normalize();
        for (Path f : files) {
            for (String name : SheetWriter.outputNames(StudyInputs.baseName(f), chosen)) {
                Path other = owner.putIfAbsent(name, f);
                if (other != null && !other.equals(f)) {
                    String why = "writes " + name + ", as " + other + " does - rename one of them or run them into"
                            + " different folders";
                    refused.putIfAbsent(f, why);
                    refused.putIfAbsent(other, "writes " + name + ", as " + f + " does - rename one of them or run"
                            + " them into different folders");
                }
                if (inputs.contains(target.resolve(name))) {
                    refused.putIfAbsent(f, "would write " + name + " over a study file given to this run - choose"
                            + " another output folder");
                }
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(Math.max(1, Math.min(threads, files.size())));
        List<Future<Outcome>> futures = new ArrayList<>();
        OutputCache cache = incremental ? OutputCache.load(output) : null;
        String tool = incremental ? OutputCache.tool() : null;
        for (Path f : files) {
            String why = refused.get(f);
            futures.add(pool.submit(() -> why != null ? new Outcome(f, List.of(), Verdict.NOT_READ, why)
                    : cache != null && !f.equals(StudyInputs.STDIN) ? incremental(f, chosen, cache, tool)
                    : process(f, chosen, null)));
        }
        Progress progress = new Progress(quiet ? null : err, files.size());
        List<Outcome> outcomes = new ArrayList<>();
        try {
            for (Future<Outcome> fu : futures) {
                Outcome o = fu.get();
                outcomes.add(o);
                // each study's errors as soon as it is done, in the order the studies were given
                if (!o.problems().isEmpty() || o.error() != null) {
                    progress.clear();
                    for (Problem p : o.problems()) {
                        err.println(p);
                    }
                    if (o.error() != null) {
                        err.println(TextRules.printable(o.file().toString()) + ": " + o.error());
                    }
                }
                progress.step();
            }
        } catch (ExecutionException e) {
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdownNow();
            progress.done();
        }
        int unchanged = 0;
        if (cache != null) {
            for (Outcome o : outcomes) {
                String base = StudyInputs.baseName(o.file());
                unchanged += o.unchanged() ? 1 : 0;
                if (o.digest() != null && (o.verdict() == Verdict.PASS || o.verdict() == Verdict.FAIL)) {
                    cache.put(base, new OutputCache.Entry(o.digest(), o.verdict() == Verdict.PASS, o.written()));
                } else if (!o.file().equals(StudyInputs.STDIN)) {
                    cache.forget(base);
                }
            }
            try {
                // where the folder could not be made, nothing was drawn and that error is already told
                if (Files.isDirectory(output)) {
                    cache.save(output);
                }
            } catch (IOException e) {
                // the sheets are written; the next run only draws more than it needs to
                err.println(TextRules.printable(output.resolve(OutputCache.FILE).toString()) + ": cannot write the"
                        + " cache: " + StudyInputs.reason(e) + " - the next --incremental run draws everything");
            }
        }
        Map<Verdict, List<String>> byVerdict = new java.util.EnumMap<>(Verdict.class);
        int written = 0;
        for (Outcome o : outcomes) {
            byVerdict.computeIfAbsent(o.verdict(), k -> new ArrayList<>()).add(TextRules.printable(o.file().toString()));
            written += o.unchanged() ? 0 : o.written().size();
        }
        if (quiet) {
            return exitCode(byVerdict);
        }
        out.println("sheets: " + outcomes.size() + " studies, " + count(byVerdict, Verdict.PASS) + " pass, "
                + count(byVerdict, Verdict.FAIL) + " fail, " + (count(byVerdict, Verdict.NOT_READ)
                + count(byVerdict, Verdict.INTERNAL_ERROR)) + " not read; " + written + " files in "
                + TextRules.printable(output.toString()) + (unchanged > 0 ? "; " + unchanged + " unchanged, not"
                + " drawn again" : ""));
        for (Verdict v : List.of(Verdict.FAIL, Verdict.NOT_READ, Verdict.INTERNAL_ERROR)) {
            if (byVerdict.containsKey(v)) {
                out.println("  " + v.word + ": " + String.join(", ", byVerdict.get(v)));
            }
        }
        return exitCode(byVerdict);
    }

    private static int exitCode(Map<Verdict, List<String>> byVerdict) {
        if (byVerdict.containsKey(Verdict.INTERNAL_ERROR)) {
            return ExitCodes.INTERNAL_ERROR;
        }
        return byVerdict.containsKey(Verdict.NOT_READ) ? ExitCodes.BAD_INPUT
                : byVerdict.containsKey(Verdict.FAIL) ? ExitCodes.CHECK_FAILED : ExitCodes.PASS;
    }

    private static int count(Map<Verdict, List<String>> byVerdict, Verdict v) {
        return byVerdict.getOrDefault(v, List.of()).size();
    }

    /** A study drawn again only if its inputs changed or one of its files is gone. */
    private Outcome incremental(Path file, Set<OutputFormat> chosen, OutputCache cache, String tool) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            return process(file, chosen, null);
        }
        String digest = OutputCache.digest(bytes, tool, chosen, dpi);
        Optional<OutputCache.Entry> last = cache.unchanged(StudyInputs.baseName(file), digest, output);
        if (last.isPresent()) {
            return new Outcome(file, List.of(), last.get().pass() ? Verdict.PASS : Verdict.FAIL, null,
                    last.get().files(), true, digest);
        }
        return process(file, chosen, digest);
    }

    private Outcome process(Path file, Set<OutputFormat> chosen, String digest) {
        try {
            StudyInputs.Loaded l = StudyInputs.load(file, in);
            if (l.study() == null) {
                return new Outcome(file, l.problems(), Verdict.NOT_READ, null);
            }
            StudyReport report = StudyReport.evaluate(l.study());
            Map<String, byte[]> files = SheetWriter.render(l.study(), report, chosen, dpi);
            try {
                SheetWriter.write(output, files);
            } catch (IOException e) {
                String why = Files.exists(output) && !Files.isDirectory(output)
                        ? "it is a file, not a folder - give a folder for the sheets" : StudyInputs.reason(e);
                return new Outcome(file, List.of(), Verdict.NOT_READ, "cannot write to "
                        + TextRules.printable(output.toString()) + ": " + why);
            }
            return new Outcome(file, List.of(), report.pass() ? Verdict.PASS : Verdict.FAIL, null,
                    List.copyOf(files.keySet()), false, digest);
        } catch (IOException | RuntimeException | OutOfMemoryError | StackOverflowError e) {
            // one study's defect must not abandon the others; nothing of it was written
            return new Outcome(file, List.of(), Verdict.INTERNAL_ERROR, "internal error: " + e);
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

        /** Wipes the bar, so that a message can take its line; the next step draws it again. */
        void clear() {
            if (terminal) {
                out.print("\r" + " ".repeat(50) + "\r");
                out.flush();
            }
        }

        void done() {
            clear();
        }
    }
}
