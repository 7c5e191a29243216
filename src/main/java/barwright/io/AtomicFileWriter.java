package barwright.io;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.channels.Channels;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.DirectoryStream;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.LinkOption;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFileAttributeView;
import java.nio.file.attribute.PosixFilePermission;
import java.security.SecureRandom;
import java.time.Duration;
import java.time.Instant;
import java.util.HexFormat;
import java.util.Set;
import java.util.regex.Pattern;

/**
 * Writes any file the program makes (vehicle files, CSV, JSON, PDF, pictures) so that a failure never
 * damages what was there: the content goes to a temporary file beside the target, is flushed to disk, and
 * is moved over the target in one step.
 * <ul>
 *   <li>a symbolic link is written through: its target file gets the new content, the link stays;</li>
 *   <li>an existing file keeps its permissions; a new one gets the usual default (0666 less the umask);</li>
 *   <li>the temporary name is {@code .NAME.XXXXXXXX.barwright-save}, NAME cut so the whole stays within 255
 *       bytes; such files of ours for the same target left by a killed save are removed once they are
 *       older than {@link #STALE_AFTER};</li>
 *   <li>every failure is a {@link FileWriteException} naming the person's path and the reason.</li>
 * </ul>
 */
public final class AtomicFileWriter {
    /** A temporary file of ours this old was left by a save that was killed: no save takes this long. */
    public static final Duration STALE_AFTER = Duration.ofMinutes(10);
    static final String TEMPORARY_SUFFIX = ".barwright-save";
    /** The most bytes in one file name on the common Linux, macOS and Windows file systems. */
    static final int MAX_NAME_BYTES = 255;
    private static final int RANDOM_HEX = 8;
    private static final int MAX_LINKS = 40;
    private static final SecureRandom RANDOM = new SecureRandom();

    /** Writes the content to the stream it is given; the stream is closed afterwards by the writer. */
    @FunctionalInterface
    public interface Content {
        void writeTo(OutputStream out) throws IOException;
    }

    private AtomicFileWriter() {
    }

    /** Writes text as UTF-8. */
    public static void writeText(Path target, String text) throws FileWriteException {
        writeBytes(target, text.getBytes(StandardCharsets.UTF_8));
    }

    public static void writeBytes(Path target, byte[] bytes) throws FileWriteException {
        write(target, out -> out.write(bytes));
    }

    /** Writes what the content puts into the stream (a picture, a PDF) atomically. */
    public static void write(Path target, Content content) throws FileWriteException {
        Path file = resolveLinks(target);
        Path name = file.getFileName();
        Path directory = file.getParent();
        if (name == null || directory == null) {
            throw new FileWriteException(target, "it is a folder, not a file");
        }
        if (Files.isDirectory(file)) {
            throw new FileWriteException(target, "it is a folder, not a file");
        }
        if (!Files.isDirectory(directory)) {
            throw new FileWriteException(target, Files.exists(directory)
                    ? "a part of the path is a file, not a folder" : "the folder " + directory + " does not exist");
        }
        int nameBytes = name.toString().getBytes(StandardCharsets.UTF_8).length;
        if (nameBytes > MAX_NAME_BYTES) {
            throw new FileWriteException(target, "the file name is " + nameBytes + " bytes long; a file name may "
                    + "have at most " + MAX_NAME_BYTES);
        }
        removeStaleTemporaries(directory, name.toString());
        Set<PosixFilePermission> permissions = permissionsOf(file);
        Path temporary = createTemporary(target, directory, name.toString());
        try {
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE)) {
                try (OutputStream out = Channels.newOutputStream(channel)) {
                    content.writeTo(out);
                    out.flush();
                    channel.force(true);
                }
            }
            if (permissions != null) {
                Files.setPosixFilePermissions(temporary, permissions);
            }
            try {
                Files.move(temporary, file, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException noAtomicMove) {
                Files.move(temporary, file, StandardCopyOption.REPLACE_EXISTING);
            }
        } catch (IOException failed) {
            throw new FileWriteException(target, FileWriteException.reason(failed));
        } finally {
            try {
                Files.deleteIfExists(temporary);
            } catch (IOException cannotClean) {
                // the save's own outcome is what the person needs to hear; the stale-file sweep retries later
            }
        }
    }

    /** @return the file a chain of symbolic links ends at (absolute), or the path itself where it is no link */
    static Path resolveLinks(Path target) throws FileWriteException {
        Path file = target.toAbsolutePath().normalize();
        for (int hops = 0; Files.isSymbolicLink(file); hops++) {
            if (hops == MAX_LINKS) {
                throw new FileWriteException(target, "the symbolic links go round in a circle");
            }
            try {
                Path link = Files.readSymbolicLink(file);
                Path parent = file.getParent();
                file = (parent == null ? link : parent.resolve(link)).toAbsolutePath().normalize();
            } catch (IOException unreadable) {
                throw new FileWriteException(target, FileWriteException.reason(unreadable));
            }
        }
        return file;
    }

    private static Set<PosixFilePermission> permissionsOf(Path file) {
        PosixFileAttributeView view = Files.getFileAttributeView(file, PosixFileAttributeView.class,
                LinkOption.NOFOLLOW_LINKS);
        if (view == null || !Files.exists(file, LinkOption.NOFOLLOW_LINKS)) {
            return null; // a new file, or a file system without permissions: the system's default applies
        }
        try {
            return view.readAttributes().permissions();
        } catch (IOException unreadable) {
            return null;
        }
    }

    /** Creates the temporary file with the default permissions for a new file (not the 0600 of a temp file). */
    private static Path createTemporary(Path target, Path directory, String name) throws FileWriteException {
        String stem = temporaryStem(name);
        for (int attempt = 0; ; attempt++) {
            Path temporary = directory.resolve(stem + HexFormat.of().toHexDigits(RANDOM.nextInt()) + TEMPORARY_SUFFIX);
            try {
                Files.newByteChannel(temporary, StandardOpenOption.CREATE_NEW, StandardOpenOption.WRITE).close();
                return temporary;
            } catch (FileAlreadyExistsException taken) {
                if (attempt == 10) {
                    throw new FileWriteException(target, "no free temporary name beside it");
                }
            } catch (IOException failed) {
                throw new FileWriteException(target, FileWriteException.reason(failed));
            }
        }
    }

    /** @return ".NAME." with NAME cut (at a character boundary) so the whole temporary name fits in 255 bytes */
    static String temporaryStem(String name) {
        int room = MAX_NAME_BYTES - 2 - RANDOM_HEX - TEMPORARY_SUFFIX.length();
        StringBuilder kept = new StringBuilder();
        int bytes = 0;
        for (int i = 0; i < name.length(); ) {
            int codePoint = name.codePointAt(i);
            int size = new String(Character.toChars(codePoint)).getBytes(StandardCharsets.UTF_8).length;
            if (bytes + size > room) {
                break;
            }
            kept.appendCodePoint(codePoint);
            bytes += size;
            i += Character.charCount(codePoint);
        }
        return "." + kept + ".";
    }

    /** Removes temporary files of ours for this target that a killed save left, once they are stale. */
    private static void removeStaleTemporaries(Path directory, String name) {
        String stem = temporaryStem(name);
        Pattern ours = Pattern.compile(Pattern.quote(stem) + "[0-9a-f]{" + RANDOM_HEX + "}"
                + Pattern.quote(TEMPORARY_SUFFIX));
        FileTime before = FileTime.from(Instant.now().minus(STALE_AFTER));
        try (DirectoryStream<Path> candidates = Files.newDirectoryStream(directory,
                entry -> ours.matcher(entry.getFileName().toString()).matches())) {
            for (Path candidate : candidates) {
                if (Files.isRegularFile(candidate, LinkOption.NOFOLLOW_LINKS)
                        && Files.getLastModifiedTime(candidate, LinkOption.NOFOLLOW_LINKS).compareTo(before) < 0) {
                    Files.deleteIfExists(candidate);
                }
            }
        } catch (IOException notNow) {
            // cleaning is a courtesy: a folder that cannot be listed does not stop the save
        }
    }
}
