package coordination.plot.cli;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.List;
import picocli.CommandLine.Option;

/** The options that choose which study files a batch command reads: {@code --recursive}, {@code --shard}. */
final class StudySelection {
    @Option(names = {"-r", "--recursive"}, description = "search folders in their subfolders too (hidden ones are"
            + " skipped)")
    boolean recursive;

    @Option(names = "--shard", paramLabel = "I/N", description = "take only the I-th of N shares of the studies"
            + " (1 <= I <= N; every N-th file in the order listed), so that N jobs share a batch")
    String shard;

    /**
     * The files this run takes.
     *
     * @param inputs the command's files and folders
     * @param command the command's name, for messages
     * @param err where problems go
     * @return the files, possibly none when a share is empty; null after a mistake, reported
     */
    List<Path> files(List<Path> inputs, String command, PrintStream err) {
        List<Path> files = StudyInputs.collect(inputs, recursive, err);
        if (files == null) {
            return null;
        }
        if (files.isEmpty()) {
            err.println("coordination " + command + ": no study files (*.yaml) in " + inputs);
            return null;
        }
        // a share may be empty when there are more jobs than studies: not a mistake
        return StudyInputs.shard(files, shard, command, err);
    }
}
