package org.streetcomb.cli;

import java.io.IOException;
import java.lang.reflect.Field;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collection;
import java.util.List;
import java.util.Locale;
import java.util.regex.Pattern;
import org.streetcomb.InputError;
import picocli.CommandLine;
import picocli.CommandLine.Model.ArgSpec;
import picocli.CommandLine.Model.OptionSpec;

/**
 * Refuses, before anything is read or written, a command line whose outputs would replace one of its inputs
 * or each other, or would write over something that is not a plain file.
 *
 * <p>Inputs are the command's file arguments that are not marked {@link Writes}; an input stands for every
 * file it brings along: a shapefile for all files sharing its base name (the ESRI shapefile description's
 * .shp, .shx, .dbf and the customary .prj, .cpg), a GeoPackage for its SQLite journal files. Outputs stand
 * for the per-vehicle files written beside them ({@code name-vehicle-N.ext}). Paths are compared by real path
 * and, where both files exist, by {@link Files#isSameFile} (hard links). A symbolic link or a FIFO at an
 * output is refused rather than written through: the atomic move that keeps outputs whole would replace the
 * link or pipe with a plain file, and writing through it would give up that wholeness. Linear in the number of
 * file arguments times their sidecars.
 */
final class OutputGuard {

    /** The one-line refusal: exit 2 (the command line is wrong) with no pointer to the help. */
    static final class Clash extends CommandLine.ParameterException {
        private static final long serialVersionUID = 1L;

        Clash(CommandLine line, String message) {
            super(line, message);
        }
    }

    private record Arg(String name, Path path, boolean folder) {
    }

    private OutputGuard() {
    }

    /** Checks the subcommand that is about to run. */
    static void check(CommandLine.ParseResult parsed) {
        CommandLine.ParseResult sub = parsed;
        while (sub.hasSubcommand()) {
            sub = sub.subcommand();
        }
        List<Arg> inputs = new ArrayList<>();
        List<Arg> outputs = new ArrayList<>();
        for (ArgSpec arg : sub.matchedArgs()) {
            Writes writes = arg.userObject() instanceof Field f ? f.getAnnotation(Writes.class) : null;
            String name = arg instanceof OptionSpec option ? option.longestName() : arg.paramLabel();
            for (Path path : paths(arg)) {
                (writes != null ? outputs : inputs).add(new Arg(name, path, writes != null && writes.folder()));
            }
        }
        CommandLine line = sub.commandSpec().commandLine();
        for (int i = 0; i < outputs.size(); i++) {
            Arg out = outputs.get(i);
            checkKind(line, out);
            for (Arg in : inputs) {
                for (Path part : parts(in.path())) {
                    if (touches(out, part)) {
                        throw new Clash(line, out.name() + " would write over " + part + ", which " + in.name()
                                + (part.equals(in.path()) ? " reads" : " reads as part of " + in.path().getFileName())
                                + ": choose another output");
                    }
                }
            }
            for (Arg other : outputs.subList(0, i)) {
                if (same(out.path(), other.path()) || touches(out, other.path()) || touches(other, out.path())) {
                    throw new Clash(line, other.name() + " and " + out.name() + " both write " + out.path()
                            + ": one would replace the other");
                }
            }
        }
    }

    /** The paths an argument holds: a Path, a list of Paths, or text naming an existing file (--crs FILE). */
    private static List<Path> paths(ArgSpec arg) {
        Object value = arg.getValue();
        List<Path> paths = new ArrayList<>();
        if (value instanceof Path path) {
            paths.add(path);
        } else if (value instanceof Collection<?> list) {
            list.stream().filter(Path.class::isInstance).map(Path.class::cast).forEach(paths::add);
        } else if (value instanceof String text && arg.paramLabel().contains("FILE")) {
            try {
                Path path = Path.of(text);
                if (Files.isRegularFile(path)) {
                    paths.add(path);
                }
            } catch (RuntimeException notAPath) {
                // WKT text or a code, not a file
            }
        }
        return paths;
    }

    /**
     * Refuses an output that exists and is not what it should be (a plain file, or a folder), or whose folder
     * is missing or read-only: found before any work, so no other output is written first.
     */
    private static void checkKind(CommandLine line, Arg out) {
        Path path = out.path();
        if (out.folder()) {
            if (Files.exists(path) && !Files.isDirectory(path)) {
                throw new Clash(line, out.name() + " " + path + " is not a folder");
            }
            Path existing = path.toAbsolutePath();
            while (existing != null && !Files.exists(existing)) {
                existing = existing.getParent();
            }
            writable(line, out, existing);
            return;
        }
        Path folder = path.toAbsolutePath().getParent();
        if (folder == null || !Files.isDirectory(folder)) {
            throw new CommandLine.ExecutionException(line, "missing folder", InputError.at(path, null,
                    "cannot write: folder " + folder + " does not exist (given as " + out.name() + ")"));
        }
        writable(line, out, folder);
        if (Files.isSymbolicLink(path)) {
            throw new Clash(line, out.name() + " " + path + " is a symbolic link: name the file it points to, "
                    + "or another file");
        }
        if (Files.exists(path, LinkOption.NOFOLLOW_LINKS) && !Files.isRegularFile(path, LinkOption.NOFOLLOW_LINKS)) {
            throw new Clash(line, out.name() + " " + path + " is not a plain file ("
                    + (Files.isDirectory(path) ? "a folder" : "a pipe or device") + "): choose a file to write");
        }
    }

    private static void writable(CommandLine line, Arg out, Path folder) {
        if (folder != null && !Files.isWritable(folder)) {
            throw new CommandLine.ExecutionException(line, "read-only folder", InputError.at(out.path(), null,
                    "cannot write: folder " + folder + " is not writable (given as " + out.name() + ")"));
        }
    }

    /** Whether writing {@code out} may replace {@code file}. */
    private static boolean touches(Arg out, Path file) {
        if (out.folder()) {
            // the folder itself, or anything the batch may write in it: summary.csv and one folder per area
            Path folder = real(out.path());
            Path target = real(file);
            Path inside = folder.relativize(target);
            return target.startsWith(folder)
                    && (target.equals(folder) || inside.getNameCount() > 1 || inside.toString().equals("summary.csv"));
        }
        if (same(out.path(), file)) {
            return true;
        }
        Path mine = real(out.path());
        Path theirs = real(file);
        return mine.getParent() != null && mine.getParent().equals(theirs.getParent())
                && perVehicle(mine.getFileName().toString()).matcher(theirs.getFileName().toString()).matches();
    }

    /** {@code name.ext} to a pattern for {@code name-vehicle-N.ext}, the files written per vehicle. */
    private static Pattern perVehicle(String name) {
        int dot = name.lastIndexOf('.');
        String base = dot > 0 ? name.substring(0, dot) : name;
        String ext = dot > 0 ? name.substring(dot) : "";
        return Pattern.compile(Pattern.quote(base) + "-vehicle-\\d+" + Pattern.quote(ext));
    }

    /** The files an input is read from: the file, a shapefile's sidecars, a GeoPackage's journals. */
    static List<Path> parts(Path input) {
        List<Path> parts = new ArrayList<>(List.of(input));
        String name = input.getFileName() == null ? "" : input.getFileName().toString();
        String lower = name.toLowerCase(Locale.ROOT);
        Path folder = input.toAbsolutePath().getParent();
        if (lower.endsWith(".shp") && folder != null && Files.isDirectory(folder)) {
            String base = name.substring(0, name.length() - 4).toLowerCase(Locale.ROOT) + ".";
            try (DirectoryStream<Path> siblings = Files.newDirectoryStream(folder)) {
                for (Path sibling : siblings) {
                    String other = sibling.getFileName().toString();
                    if (!other.equals(name) && other.toLowerCase(Locale.ROOT).startsWith(base)) {
                        parts.add(sibling);
                    }
                }
            } catch (IOException unreadable) {
                // the reader reports an unreadable folder in its own words
            }
            for (String ext : new String[] {".shx", ".dbf", ".prj", ".cpg"}) {
                parts.add(input.resolveSibling(name.substring(0, name.length() - 4) + ext));
            }
        } else if (lower.endsWith(".gpkg")) {
            for (String suffix : new String[] {"-wal", "-shm", "-journal"}) {
                parts.add(input.resolveSibling(name + suffix));
            }
        }
        return parts;
    }

    private static boolean same(Path a, Path b) {
        if (Files.exists(a) && Files.exists(b)) {
            try {
                return Files.isSameFile(a, b);
            } catch (IOException unreadable) {
                // fall back to comparing real paths
            }
        }
        return real(a).equals(real(b));
    }

    /** The real path of a file, or of its nearest existing folder with the rest appended when it does not exist. */
    private static Path real(Path path) {
        Path absolute = path.toAbsolutePath().normalize();
        Path rest = absolute.getFileSystem().getPath("");
        for (Path at = absolute; at != null; at = at.getParent()) {
            try {
                return at.toRealPath().resolve(rest);
            } catch (IOException missing) {
                if (at.getFileName() == null) {
                    break;
                }
                rest = at.getFileName().resolve(rest);
            }
        }
        return absolute;
    }
}
