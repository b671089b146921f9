package coordination.plot.cli;

import coordination.core.study.Problem;
import coordination.core.study.Study;
import coordination.core.study.StudyFileException;
import coordination.core.study.StudyReader;
import java.io.IOException;
import java.io.PrintStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/** Turns the command's arguments into study files: a folder means every {@code *.yaml} in it. */
final class StudyInputs {
    private StudyInputs() {
    }

    /**
     * Lists the study files named by the arguments, in a stable order.
     *
     * @param args files and folders
     * @param err where problems go
     * @return the files, or null if an argument is neither a readable file nor a folder
     */
    static List<Path> collect(List<Path> args, PrintStream err) {
        List<Path> files = new ArrayList<>();
        boolean ok = true;
        for (Path a : args) {
            if (Files.isDirectory(a)) {
                try (Stream<Path> s = Files.list(a)) {
                    s.filter(p -> {
                        String n = p.getFileName().toString();
                        return (n.endsWith(".yaml") || n.endsWith(".yml")) && !n.startsWith(".") && Files.isRegularFile(p);
                    }).sorted().forEach(files::add);
                } catch (IOException e) {
                    err.println(a + ": cannot list the folder: " + e.getMessage());
                    ok = false;
                }
            } else if (Files.isRegularFile(a)) {
                files.add(a);
            } else {
                err.println(a + ": no such study file or folder");
                ok = false;
            }
        }
        return ok ? files : null;
    }

    static String baseName(Path file) {
        String n = file.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }

    /** A study read, or the problems that stopped it. */
    record Loaded(Path file, Study study, List<Problem> problems) {
    }

    static Loaded load(Path file) {
        try {
            return new Loaded(file, StudyReader.read(file), List.of());
        } catch (StudyFileException e) {
            return new Loaded(file, null, e.problems());
        }
    }
}
