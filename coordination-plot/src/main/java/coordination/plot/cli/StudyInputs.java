package coordination.plot.cli;

import coordination.core.study.Problem;
import coordination.core.study.Study;
import coordination.core.study.StudyFileException;
import coordination.core.study.StudyReader;
import coordination.core.study.TextRules;
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
        return collect(args, false, err);
    }

    /** The argument that stands for standard input. */
    static final Path STDIN = Path.of("-");

    /**
     * Lists the study files named by the arguments, in a stable order.
     *
     * @param args files and folders; {@code -} is standard input, once
     * @param recursive whether folders are searched in their subfolders too (hidden ones skipped)
     * @param err where problems go
     * @return the files, or null if an argument is neither a readable file nor a folder
     */
    static List<Path> collect(List<Path> args, boolean recursive, PrintStream err) {
        List<Path> files = new ArrayList<>();
        boolean ok = true;
        for (Path a : args) {
            String shown = TextRules.printable(a.toString());
            if (a.equals(STDIN)) {
                if (files.contains(STDIN)) {
                    err.println("-: standard input can be read once - give '-' once");
                    ok = false;
                } else {
                    files.add(STDIN);
                }
            } else if (Files.isDirectory(a)) {
                try (Stream<Path> s = recursive ? Files.walk(a) : Files.list(a)) {
                    for (Path p : s.sorted().toList()) {
                        String n = p.getFileName().toString();
                        if (!isStudyName(n) || !Files.isRegularFile(p) || recursive && hiddenBelow(a, p)) {
                            continue;
                        }
                        if (n.startsWith(".")) {
                            err.println(TextRules.printable(p.toString()) + ": skipped - hidden files are not read"
                                    + " from a folder; name the file to read it");
                            continue;
                        }
                        files.add(p);
                    }
                } catch (IOException e) {
                    err.println(shown + ": cannot list the folder: " + reason(e));
                    ok = false;
                } catch (java.io.UncheckedIOException e) {
                    // a subfolder a recursive search cannot enter: the walk reports it this way
                    err.println(shown + ": cannot list the folder: " + reason(e.getCause()));
                    ok = false;
                }
            } else if (Files.isRegularFile(a)) {
                files.add(a);
            } else if (Files.exists(a)) {
                err.println(shown + ": not a regular file (a pipe, a device or a socket) - give a study file");
                ok = false;
            } else {
                err.println(shown + ": no such study file or folder");
                ok = false;
            }
        }
        return ok ? files : null;
    }

    /** Whether a file found by a recursive search lies in a hidden folder below the one named. */
    private static boolean hiddenBelow(Path root, Path file) {
        Path rel = root.relativize(file).getParent();
        if (rel == null) {
            return false;
        }
        for (Path part : rel) {
            if (part.toString().startsWith(".")) {
                return true;
            }
        }
        return false;
    }

    /**
     * The share of the files one of N jobs takes: every N-th, from the I-th, in the order listed.
     *
     * @param files the files, in a stable order
     * @param spec {@code I/N}, or null for all
     * @param command the command's name, for the message
     * @param err where a bad spec is reported
     * @return the share, or null if the spec is bad
     */
    static List<Path> shard(List<Path> files, String spec, String command, PrintStream err) {
        if (spec == null) {
            return files;
        }
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("\\s*(\\d{1,6})\\s*/\\s*(\\d{1,6})\\s*")
                .matcher(spec);
        int i = m.matches() ? Integer.parseInt(m.group(1)) : 0;
        int n = m.matches() ? Integer.parseInt(m.group(2)) : 0;
        if (!(n >= 1 && i >= 1 && i <= n)) {
            err.println("coordination " + command + ": --shard: found '" + TextRules.printable(spec)
                    + "' - give I/N with 1 <= I <= N, e.g. 2/8");
            return null;
        }
        List<Path> share = new ArrayList<>();
        for (int k = i - 1; k < files.size(); k += n) {
            share.add(files.get(k));
        }
        return share;
    }

    /** A study file's name ends in .yaml or .yml, in any case. */
    static boolean isStudyName(String name) {
        String n = name.toLowerCase(java.util.Locale.ROOT);
        return n.endsWith(".yaml") || n.endsWith(".yml");
    }

    /** Why a file operation failed, in words rather than an exception's name. */
    static String reason(IOException e) {
        if (e instanceof java.nio.file.AccessDeniedException) {
            return "permission denied";
        }
        if (e instanceof java.nio.file.NoSuchFileException) {
            return "no such file or folder";
        }
        return TextRules.printable(String.valueOf(e.getMessage()));
    }

    static String baseName(Path file) {
        if (file.equals(STDIN)) {
            return "stdin";
        }
        String n = file.getFileName().toString();
        int dot = n.lastIndexOf('.');
        return dot > 0 ? n.substring(0, dot) : n;
    }

    /** A study read, or the problems that stopped it. */
    record Loaded(Path file, Study study, List<Problem> problems) {
    }

    static Loaded load(Path file, java.io.InputStream stdin) {
        try {
            if (file.equals(STDIN)) {
                return new Loaded(file, StudyReader.read(stdin, "<stdin>", "stdin"), List.of());
            }
            return new Loaded(file, StudyReader.read(file), List.of());
        } catch (StudyFileException e) {
            return new Loaded(file, null, e.problems());
        } catch (IOException e) {
            return new Loaded(file, null, List.of(new Problem("<stdin>", 1, 1, "", "cannot read standard input: "
                    + reason(e))));
        }
    }
}
