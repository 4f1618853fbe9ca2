package org.hobwright.wizard.store;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.Map;
import java.util.Objects;
import org.hobwright.text.JsonTrees;
import tools.jackson.core.JacksonException;
import tools.jackson.core.JsonParser;
import tools.jackson.core.JsonToken;
import tools.jackson.core.TokenStreamLocation;
import tools.jackson.databind.node.ObjectNode;

/**
 * A JSON text read into a tree, remembering the line of every key so that findings can say
 * where a problem is. Field paths use dots and brackets: {@code gear.module}, {@code list[2]}.
 *
 * @param source name of the file or text, for messages
 * @param root   the tree (an object)
 * @param lines  line number (1-based) of each key's path; empty for trees not read from text
 */
public record JsonDocument(String source, ObjectNode root, Map<String, Integer> lines) {
    /**
     * The field a finding names for a key path: the path itself, or the path in quotes when it is
     * blank (the key {@code ""} or {@code " "} at the top of a file), so that the finding still
     * names it.
     */
    static String field(String path) {
        return path.isBlank() ? "\"" + path + "\"" : path;
    }

    /** Largest file read, in bytes (1 MB): job and library files are a few kilobytes. */
    public static final long MAX_BYTES = 1_000_000;


    public JsonDocument {
        Objects.requireNonNull(source, "source");
        Objects.requireNonNull(root, "root");
        lines = Map.copyOf(lines);
    }

    /** A tree built in memory (no lines known); the tree is copied. */
    public static JsonDocument ofTree(ObjectNode tree, String source) {
        return new JsonDocument(source, tree.deepCopy(), Map.of());
    }

    /**
     * Reads a file: it must exist, be a regular file of at most {@link #MAX_BYTES} bytes, be
     * UTF-8, and hold one JSON object with no repeated keys.
     */
    public static Loaded<JsonDocument> read(Path file) {
        return text(file).then(t -> parse(t, file.toString()));
    }

    /**
     * A file's text: it must exist, be a regular file of at most {@link #MAX_BYTES} bytes and be
     * UTF-8. At most one byte more than the limit is read, whatever size the file system reports
     * (a file under {@code /proc} reports 0 bytes and may hold more, or never end).
     */
    public static Loaded<String> text(Path file) {
        String source = file.toString();
        if (!Files.exists(file)) {
            return Loaded.unreadable(InputCode.INPUT_NO_FILE.at("file",
                    source + ": no such file", "check the path"));
        }
        if (!Files.isRegularFile(file)) {
            return Loaded.unreadable(InputCode.INPUT_NOT_A_FILE.at("file", source + (Files.isDirectory(file)
                    ? ": is a folder, not a file" : ": is not a regular file (a device, a pipe or a socket)"),
                    "name a .json file"));
        }
        String fix = "a job or library file is a few kilobytes; check that this is the right file";
        try {
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                return Loaded.unreadable(InputCode.INPUT_TOO_LARGE.at("file",
                        source + ": " + size + " bytes is more than the limit of " + MAX_BYTES + " bytes", fix));
            }
            byte[] bytes;
            try (InputStream in = Files.newInputStream(file)) {
                bytes = in.readNBytes((int) MAX_BYTES + 1);
            }
            if (bytes.length > MAX_BYTES) {
                return Loaded.unreadable(InputCode.INPUT_TOO_LARGE.at("file",
                        source + ": more than the limit of " + MAX_BYTES + " bytes", fix));
            }
            return Loaded.of(StandardCharsets.UTF_8.newDecoder()
                    .onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT)
                    .decode(ByteBuffer.wrap(bytes)).toString());
        } catch (CharacterCodingException e) {
            return Loaded.unreadable(InputCode.INPUT_IO.at("file",
                    source + ": not UTF-8 text", "save the file as UTF-8"));
        } catch (IOException e) {
            return Loaded.unreadable(InputCode.INPUT_IO.at("file",
                    source + ": cannot be read (" + e.getClass().getSimpleName() + ": " + e.getMessage() + ")",
                    "check the file's permissions"));
        }
    }

    /** Parses a JSON text; {@code source} names it in messages. */
    public static Loaded<JsonDocument> parse(String json, String source) {
        if (json.length() > MAX_BYTES) {
            return Loaded.unreadable(InputCode.INPUT_TOO_LARGE.at("file",
                    source + ": more than the limit of " + MAX_BYTES + " characters", null));
        }
        Map<String, Integer> lines = new HashMap<>();
        try (JsonParser p = JsonTrees.parser(json)) {
            JsonToken first = p.nextToken();
            if (first != JsonToken.START_OBJECT) {
                return Loaded.unreadable(InputCode.INPUT_MALFORMED.at("file",
                        source + ":" + line(p.currentTokenLocation()) + ": the file must hold one JSON object { ... }",
                        null));
            }
            ObjectNode root = JsonTrees.readObject(p, "", lines::put);
            JsonToken after = p.nextToken();
            if (after != null) {
                return Loaded.unreadable(InputCode.INPUT_MALFORMED.at("file",
                        source + ":" + line(p.currentTokenLocation()) + ": text after the end of the JSON object",
                        "remove everything after the closing brace"));
            }
            return Loaded.of(new JsonDocument(source, root, lines));
        } catch (JsonTrees.DuplicateKey e) {
            return Loaded.unreadable(InputCode.INPUT_MALFORMED.at(field(e.path()),
                    source + ":" + e.line() + ": key \"" + e.path() + "\" appears twice", "keep one of them"));
        } catch (JacksonException e) {
            return Loaded.unreadable(InputCode.INPUT_MALFORMED.at("file",
                    source + ":" + line(e.getLocation()) + ": malformed JSON: " + JsonTrees.message(e),
                    "check brackets, commas and quotes near that line"));
        }
    }

    /** Where a key is: {@code source:line}, or just the source when the line is not known. */
    public String at(String path) {
        Integer line = lines.get(path);
        if (line == null && path.contains(".")) {
            line = lines.get(path.substring(0, path.lastIndexOf('.')));
        }
        return line == null ? source : source + ":" + line;
    }

    private static String line(TokenStreamLocation loc) {
        return loc == null || loc.getLineNr() < 0 ? "?" : Integer.toString(loc.getLineNr());
    }
}
