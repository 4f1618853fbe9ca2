package org.hobwright.wizard.store;

import java.io.IOException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.Optional;
import java.util.TreeMap;
import java.util.function.Function;
import java.util.function.Supplier;
import java.util.stream.Stream;
import org.hobwright.api.check.Finding;
import org.hobwright.text.JsonTrees;

/**
 * The files of the library folder over the built-in ones: find, list, save and remove entries
 * by folder and name. Every name is checked before it touches the file system.
 */
final class Shelf {
    /** Temporary files of a save older than this were left by a save that was killed. */
    private static final Duration STALE = Duration.ofHours(1);

    private final Path home;
    private final Builtins builtins;

    Shelf(Path home, Builtins builtins) {
        this.home = home;
        this.builtins = builtins;
    }

    Path home() {
        return home;
    }

    Builtins builtins() {
        return builtins;
    }

    Path folder(String relative) {
        return home.resolve(relative);
    }

    Path file(String folder, String name) {
        return folder(folder).resolve(name + ".json");
    }

    Loaded<JsonDocument> document(String folder, String what, String name) {
        return named(what, name, () -> {
            Path saved = file(folder, name);
            if (Files.exists(saved)) {
                return JsonDocument.read(saved);
            }
            Optional<String> text = builtins.text(folder + "/" + name + ".json");
            if (text.isPresent()) {
                return JsonDocument.parse(text.get(), "built-in " + folder + "/" + name + ".json");
            }
            return Loaded.unreadable(notFound(folder, what, name));
        });
    }

    Loaded<String> text(String folder, String what, String name) {
        return named(what, name, () -> {
            Path saved = file(folder, name);
            if (Files.isRegularFile(saved)) {
                return JsonDocument.text(saved).then(t -> JsonDocument.parse(t, saved.toString())
                        .map(d -> JsonTrees.withoutByteOrderMark(t)));
            }
            return builtins.text(folder + "/" + name + ".json").map(t -> Loaded.of(withoutSchemaLine(t)))
                    .orElseGet(() -> Loaded.unreadable(notFound(folder, what, name)));
        });
    }

    /**
     * A built-in file's text without its {@code "$schema"} line: that path is relative to the
     * samples folder of the repository and means nothing where the text is shown or copied to
     * (saved files carry no {@code $schema} either).
     */
    static String withoutSchemaLine(String text) {
        StringBuilder out = new StringBuilder(text.length());
        for (String line : text.split("\n", -1)) {
            if (!line.strip().startsWith("\"$schema\"")) {
                out.append(line).append('\n');
            }
        }
        return out.substring(0, out.length() - 1);
    }

    /** Checks a name first: a bad name is unreadable input and nothing else is done. */
    static <T> Loaded<T> named(String what, String name, Supplier<Loaded<T>> then) {
        return Names.check(what, name).<Loaded<T>>map(Loaded::unreadable).orElseGet(then);
    }

    Finding notFound(String folder, String what, String name) {
        return InputCode.LIBRARY_NOT_FOUND.at(what, "no " + what + " \"" + name + "\" in " + folder(folder)
                + " or among the built-in ones", "list them with the " + (what.equals("template") ? "templates"
                : what + "s") + " list command, or save one first");
    }

    List<LibraryEntry> list(String folder, String machine, Function<JsonDocument, String> describe) {
        TreeMap<String, LibraryEntry> out = new TreeMap<>();
        for (String n : builtins.names(folder)) {
            String desc = builtins.text(folder + "/" + n + ".json")
                    .flatMap(t -> JsonDocument.parse(t, n).value()).map(describe).orElse("");
            out.put(n, new LibraryEntry(n, machine, true, false, desc, "built-in"));
        }
        for (String n : savedNames(folder(folder))) {
            Path p = file(folder, n);
            String desc = JsonDocument.read(p).value().map(describe).orElse("");
            out.put(n, new LibraryEntry(n, machine, false, out.containsKey(n), desc, p.toString()));
        }
        return List.copyOf(out.values());
    }

    private static List<String> savedNames(Path dir) {
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(Files::isRegularFile).map(p -> p.getFileName().toString())
                    .filter(n -> n.endsWith(".json")).map(n -> n.substring(0, n.length() - 5))
                    .filter(Names::valid).sorted().toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    static List<String> savedFolders(Path dir) {
        if (!Files.isDirectory(dir)) {
            return List.of();
        }
        try (Stream<Path> s = Files.list(dir)) {
            return s.filter(Files::isDirectory).map(p -> p.getFileName().toString()).filter(Names::valid)
                    .sorted().toList();
        } catch (IOException e) {
            return List.of();
        }
    }

    Loaded<Path> save(String folder, String name, String what, String text, boolean force) {
        return named(what, name, () -> {
            Path target = file(folder, name);
            Optional<Finding> linked = linked(folder, what);
            if (linked.isPresent()) {
                return Loaded.unreadable(linked.get());
            }
            try {
                AtomicFiles.writeText(target, text, force);
                AtomicFiles.removeStaleTemps(target.getParent(), target.getFileName().toString(), STALE);
                return Loaded.of(target);
            } catch (FileAlreadyExistsException e) {
                return Loaded.unreadable(List.of(InputCode.LIBRARY_EXISTS.at(what,
                        target + ": a saved " + what + " \""
                        + name + "\" exists already", "add --force to replace it")));
            } catch (IOException | RuntimeException e) {
                return Loaded.unreadable(List.of(InputCode.LIBRARY_WRITE_FAILED.at(what,
                        target + ": cannot be written ("
                        + e.getClass().getSimpleName() + ": " + e.getMessage() + "); nothing was changed", null)));
            }
        });
    }

    Loaded<Path> remove(String folder, String what, String name) {
        return named(what, name, () -> {
            Path target = file(folder, name);
            Optional<Finding> linked = linked(folder, what);
            if (linked.isPresent()) {
                return Loaded.unreadable(linked.get());
            }
            try {
                if (Files.deleteIfExists(target)) {
                    return Loaded.of(target);
                }
            } catch (IOException e) {
                return Loaded.unreadable(List.of(InputCode.LIBRARY_WRITE_FAILED.at(what,
                        target + ": cannot be removed ("
                        + e.getMessage() + ")", null)));
            }
            if (builtins.text(folder + "/" + name + ".json").isPresent()) {
                return Loaded.unreadable(List.of(InputCode.LIBRARY_READ_ONLY.at(what, "the " + what + " \"" + name
                        + "\" is built in and cannot be removed", "save one of the same name to use instead of it")));
            }
            return Loaded.unreadable(notFound(folder, what, name));
        });
    }

    /**
     * A library folder below the home (machines, templates and each machine's, dialects) that is a
     * symbolic link: a save would land outside the library, so it is refused.
     */
    private Optional<Finding> linked(String folder, String what) {
        Path p = home;
        for (String part : folder.split("/")) {
            p = p.resolve(part);
            if (Files.isSymbolicLink(p)) {
                return Optional.of(InputCode.LIBRARY_WRITE_FAILED.at(what, p + " is a symbolic link; the library"
                        + " keeps its files in real folders (a save would land outside it); nothing was changed",
                        "replace the link by a folder, or give --home the folder the link points to"));
            }
        }
        return Optional.empty();
    }
}
