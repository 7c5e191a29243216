package barwright.io;

import com.fasterxml.jackson.core.JsonFactory;
import com.fasterxml.jackson.core.JsonLocation;
import com.fasterxml.jackson.core.JsonParser;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.JsonStreamContext;
import com.fasterxml.jackson.core.JsonToken;
import com.fasterxml.jackson.core.StreamReadConstraints;
import com.fasterxml.jackson.core.io.JsonEOFException;
import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;

import java.io.IOException;
import java.io.InputStream;
import java.nio.ByteBuffer;
import java.nio.CharBuffer;
import java.nio.charset.CharsetDecoder;
import java.nio.charset.CoderResult;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.HashSet;
import java.util.Set;

/**
 * The one JSON reader for every file the program reads (vehicle files, catalogues, sizing results and the
 * files still to come). The same limits hold for all of them, and every refusal is in the program's own
 * words with the line and column, and the key path where one is known:
 * <ul>
 *   <li>at most {@link #MAX_BYTES} bytes, read no further than that (a device that never ends is refused);</li>
 *   <li>UTF-8 text; a leading byte-order mark is accepted; a byte that is not UTF-8 is named;</li>
 *   <li>at most {@link #MAX_NESTING} levels of {...} and [...];</li>
 *   <li>numbers of at most {@link #MAX_NUMBER_LENGTH} characters, keys of at most {@link #MAX_KEY_LENGTH};</li>
 *   <li>each key once in an object, and nothing after the one JSON value.</li>
 * </ul>
 * NaN and Infinity are read as numbers so that the reader of the file's kind refuses them by key path.
 */
public final class JsonInput {
    /** The largest file read (bytes): a vehicle file is a few kilobytes. */
    public static final long MAX_BYTES = 4L * 1024 * 1024;
    /** The deepest nesting of objects and lists read; a vehicle file is 5 levels deep. */
    public static final int MAX_NESTING = 32;
    /** The longest number (characters): a double needs at most 24. */
    public static final int MAX_NUMBER_LENGTH = 100;
    /** The longest key (characters): the file's own keys are under 40. */
    public static final int MAX_KEY_LENGTH = 200;

    // the limits above are checked by the token pass below, in the program's words; Jackson's own limits are
    // set past them so that they never speak first
    private static final JsonFactory FACTORY = JsonFactory.builder()
            .streamReadConstraints(StreamReadConstraints.builder()
                    .maxNestingDepth(MAX_NESTING + 1)
                    .maxNumberLength(Integer.MAX_VALUE)
                    .maxNameLength(Integer.MAX_VALUE)
                    .build())
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS)
            .build();
    private static final ObjectMapper MAPPER = JsonMapper.builder(FACTORY).build();
    private static final byte[] UTF8_MARK = {(byte) 0xEF, (byte) 0xBB, (byte) 0xBF};

    private JsonInput() {
    }

    /**
     * Reads a file whole, within the limits.
     *
     * @param kind what the file should be, for the size message, e.g. "a vehicle file"
     */
    public static JsonNode read(Path file, String kind) throws JsonInputException {
        return parse(readBytes(file, kind), kind);
    }

    /**
     * @return the file's bytes, at most {@link #MAX_BYTES}
     * @throws JsonInputException where the file is missing, a directory, unreadable or too large
     */
    public static byte[] readBytes(Path file, String kind) throws JsonInputException {
        if (Files.isDirectory(file)) {
            throw new JsonInputException(file + " is a directory: give the path of " + kind);
        }
        try {
            long size = Files.size(file);
            if (size > MAX_BYTES) {
                throw tooLarge(size, kind);
            }
            // read one byte past the limit: a device or a growing file reports a size it does not keep to
            try (InputStream in = Files.newInputStream(file)) {
                byte[] content = in.readNBytes((int) MAX_BYTES + 1);
                if (content.length > MAX_BYTES) {
                    throw new JsonInputException("the file is larger than " + MAX_BYTES / 1048576 + " MB: "
                            + kind + " must be under " + MAX_BYTES / 1048576 + " MB");
                }
                return content;
            }
        } catch (NoSuchFileException missing) {
            throw new JsonInputException("file not found: " + file);
        } catch (AccessDeniedException denied) {
            throw new JsonInputException("cannot read " + file + ": permission denied");
        } catch (IOException failed) {
            throw new JsonInputException("cannot read " + file + ": " + FileWriteException.reason(failed));
        }
    }

    private static JsonInputException tooLarge(long size, String kind) {
        return new JsonInputException(String.format("the file is %.1f MB: %s must be under %d MB",
                size / 1048576.0, kind, MAX_BYTES / 1048576));
    }

    /** Parses UTF-8 bytes (a byte-order mark is skipped) within the limits. */
    public static JsonNode parse(byte[] content, String kind) throws JsonInputException {
        if (content.length > MAX_BYTES) {
            throw new JsonInputException("the file is larger than " + MAX_BYTES / 1048576 + " MB: "
                    + kind + " must be under " + MAX_BYTES / 1048576 + " MB");
        }
        return parseText(decode(content));
    }

    /** Parses text within the limits (for a value typed by a person, e.g. {@code compare --variant}). */
    public static JsonNode parseText(String text) throws JsonInputException {
        if (text.isBlank()) {
            throw new JsonInputException("the file is empty: it holds no JSON value");
        }
        checkTokens(text);
        try {
            return MAPPER.readTree(text);
        } catch (JsonProcessingException unexpected) {
            // the token pass has already read the same text with the same parser settings
            throw new JsonInputException("not valid JSON" + at(unexpected.getLocation(), "") + ": "
                    + describe(text, unexpected.getLocation()));
        }
    }

    /** @return the text of UTF-8 bytes; a byte that is not UTF-8 is refused with its line and column */
    static String decode(byte[] content) throws JsonInputException {
        int start = startsWith(content, UTF8_MARK) ? UTF8_MARK.length : 0;
        if (content.length >= 2 && (content[0] == (byte) 0xFE && content[1] == (byte) 0xFF
                || content[0] == (byte) 0xFF && content[1] == (byte) 0xFE)) {
            throw new JsonInputException("the file is UTF-16 text: save it as UTF-8");
        }
        CharsetDecoder decoder = StandardCharsets.UTF_8.newDecoder()
                .onMalformedInput(CodingErrorAction.REPORT)
                .onUnmappableCharacter(CodingErrorAction.REPORT);
        ByteBuffer in = ByteBuffer.wrap(content, start, content.length - start);
        CharBuffer out = CharBuffer.allocate(content.length);
        CoderResult result = decoder.decode(in, out, true);
        if (!result.isError()) {
            result = decoder.flush(out);
        }
        if (result.isError()) {
            int offset = in.position();
            int line = 1;
            int lineStart = start;
            for (int i = start; i < offset; i++) {
                if (content[i] == '\n') {
                    line++;
                    lineStart = i + 1;
                }
            }
            int column = new String(content, lineStart, offset - lineStart, StandardCharsets.UTF_8).length() + 1;
            throw new JsonInputException(String.format("the file is not UTF-8 text: the byte 0x%02X at line %d, "
                    + "column %d (byte %d of the file) is not UTF-8; save the file as UTF-8",
                    content[offset] & 0xFF, line, column, offset + 1));
        }
        return out.flip().toString();
    }

    private static boolean startsWith(byte[] content, byte[] prefix) {
        if (content.length < prefix.length) {
            return false;
        }
        for (int i = 0; i < prefix.length; i++) {
            if (content[i] != prefix[i]) {
                return false;
            }
        }
        return true;
    }

    /** One open object or list, for the duplicate-key check. */
    private static final class Level {
        final boolean object;
        final Set<String> keys = new HashSet<>();

        Level(boolean object) {
            this.object = object;
        }
    }

    /** Reads the text token by token, refusing what breaks a limit before a tree is built. */
    private static void checkTokens(String text) throws JsonInputException {
        Deque<Level> levels = new ArrayDeque<>();
        try (JsonParser parser = FACTORY.createParser(text)) {
            try {
                JsonToken token;
                boolean rootDone = false;
                while (!rootDone && (token = parser.nextToken()) != null) {
                    switch (token) {
                        case FIELD_NAME -> {
                            Level level = levels.peek();
                            String key = parser.currentName();
                            if (key.length() > MAX_KEY_LENGTH) {
                                throw refused("refused", parser, "a key of " + key.length() + " characters (\""
                                        + key.substring(0, 20) + "...\"): a key has at most " + MAX_KEY_LENGTH
                                        + " characters");
                            }
                            if (!level.keys.add(key)) {
                                throw refused("not valid JSON", parser, "the key \"" + key + "\" appears twice in the same "
                                        + "object: give each key once");
                            }
                        }
                        case START_OBJECT, START_ARRAY -> {
                            if (levels.size() >= MAX_NESTING) {
                                throw refused("refused", parser, "the file is nested too deeply: more than "
                                        + MAX_NESTING + " levels of {...} and [...]");
                            }
                            levels.push(new Level(token == JsonToken.START_OBJECT));
                        }
                        case END_OBJECT, END_ARRAY -> {
                            levels.pop();
                            rootDone = levels.isEmpty();
                        }
                        default -> {
                            if (token.isNumeric() && parser.getTextLength() > MAX_NUMBER_LENGTH) {
                                throw refused("refused", parser, "a number of " + parser.getTextLength()
                                        + " characters: a number has at most " + MAX_NUMBER_LENGTH);
                            }
                            rootDone = levels.isEmpty();
                        }
                    }
                }
            } catch (JsonEOFException cutShort) {
                throw new JsonInputException("not valid JSON" + at(cutShort.getLocation(), path(parser))
                        + ": the text ends before the JSON is complete (a closing }, ] or \" is missing)");
            } catch (JsonProcessingException bad) {
                throw new JsonInputException("not valid JSON" + at(bad.getLocation(), path(parser)) + ": "
                        + describe(text, bad.getLocation()));
            }
            try {
                if (parser.nextToken() != null) {
                    throw new JsonInputException("not valid JSON" + at(parser.currentTokenLocation(), "")
                            + ": there is more text after the end of the object; the file holds one JSON object");
                }
            } catch (JsonProcessingException trailing) {
                throw new JsonInputException("not valid JSON" + at(trailing.getLocation(), "")
                        + ": there is more text after the end of the object; the file holds one JSON object");
            }
        } catch (IOException impossible) {
            // a parser over a string in memory reports its problems as JsonProcessingException
            throw new JsonInputException("not valid JSON: " + impossible.getClass().getSimpleName());
        }
    }

    private static JsonInputException refused(String prefix, JsonParser parser, String what) {
        return new JsonInputException(prefix + at(parser.currentTokenLocation(), path(parser)) + ": " + what);
    }

    /** @return the key path of the value the parser is at, e.g. {@code front.bar.armLengthsMm[1]} */
    private static String path(JsonParser parser) {
        Deque<String> steps = new ArrayDeque<>();
        for (JsonStreamContext context = parser.getParsingContext(); context != null && !context.inRoot();
             context = context.getParent()) {
            if (context.inObject() && context.getCurrentName() != null) {
                String key = context.getCurrentName();
                steps.push("." + (key.length() > 40 ? key.substring(0, 20) + "..." : key));
            } else if (context.inArray() && context.getCurrentIndex() >= 0) {
                steps.push("[" + context.getCurrentIndex() + "]");
            }
        }
        String path = String.join("", steps);
        return path.startsWith(".") ? path.substring(1) : path;
    }

    private static String at(JsonLocation where, String path) {
        String place = where == null ? "" : " at line " + where.getLineNr() + ", column " + where.getColumnNr();
        return path.isEmpty() ? place : place + " (near " + path + ")";
    }

    /** @return the character at the location's line and column (where the parser stopped), or a space */
    private static char characterAt(String text, JsonLocation where) {
        if (where == null || where.getLineNr() < 1 || where.getColumnNr() < 1) {
            return ' ';
        }
        int lineStart = 0;
        for (int line = 1; line < where.getLineNr() && lineStart >= 0; line++) {
            lineStart = text.indexOf('\n', lineStart);
            lineStart = lineStart < 0 ? -1 : lineStart + 1;
        }
        int index = lineStart + where.getColumnNr() - 1;
        return lineStart < 0 || index >= text.length() ? ' ' : text.charAt(index);
    }

    /** @return what is wrong at a syntax error, in plain words (the parser's own message is for developers) */
    static String describe(String text, JsonLocation where) {
        char found = characterAt(text, where);
        if (found == '\'') {
            return "texts and keys are written in double quotes \"...\", not single quotes";
        }
        if (found == '/' || found == '#') {
            return "comments are not allowed in JSON";
        }
        if (found == ',' || found == '}' || found == ']' || found == ':') {
            return "'" + found + "' where a value or a key was expected (a missing value, a doubled comma, "
                    + "or a comma before } or ])";
        }
        if (Character.isISOControl(found)) {
            return String.format("the control character U+%04X: inside a text, a line break or tab is written "
                    + "\\n or \\t", (int) found);
        }
        if (Character.isDigit(found) || found == '-' || found == '+' || found == '.') {
            return "a number written wrongly: JSON numbers look like 12, -0.5 or 2.1e5 (no leading zeros, "
                    + "no + sign, a digit on both sides of the point)";
        }
        if (Character.isLetter(found)) {
            return "a word JSON does not know: texts are written in double quotes, and the only words are "
                    + "true, false and null";
        }
        return "the character '" + found + "' cannot stand here";
    }
}
