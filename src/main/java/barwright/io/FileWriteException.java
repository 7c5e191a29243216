package barwright.io;

import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.NoSuchFileException;
import java.nio.file.NotDirectoryException;
import java.nio.file.Path;
import java.util.Locale;

/**
 * A file the person asked for could not be written: the message names their path (never a temporary file)
 * and the reason in words, e.g. {@code cannot write /cars/a.json: the folder is read-only}. It is the
 * person's problem to solve, not an internal failure: the command line exits 2.
 */
public final class FileWriteException extends IOException {
    private static final long serialVersionUID = 1L;
    private final transient Path target;

    public FileWriteException(Path target, String reason) {
        super("cannot write " + target + ": " + reason);
        this.target = target;
    }

    /** @return the path the person gave */
    public Path target() {
        return target;
    }

    /** @return the reason of a failed file operation in words, without the temporary file's name */
    static String reason(IOException failure) {
        if (failure instanceof AccessDeniedException) {
            return "permission denied (the folder or the file is read-only, or not yours)";
        }
        if (failure instanceof NoSuchFileException) {
            return "the folder does not exist";
        }
        if (failure instanceof NotDirectoryException) {
            return "a part of the path is a file, not a folder";
        }
        String system = failure instanceof FileSystemException fileSystem ? fileSystem.getReason() : null;
        String text = (system != null ? system : String.valueOf(failure.getMessage())).toLowerCase(Locale.ROOT);
        if (text.contains("no space left")) {
            return "the disk is full";
        }
        if (text.contains("disk quota")) {
            return "the disk quota is used up";
        }
        if (text.contains("read-only file system")) {
            return "the disk is mounted read-only";
        }
        if (text.contains("operation not permitted") || text.contains("permission denied")) {
            return "permission denied (the folder or the file is read-only, or not yours)";
        }
        if (text.contains("file name too long")) {
            return "the file name is too long for the disk";
        }
        if (text.contains("is a directory")) {
            return "it is a folder, not a file";
        }
        if (text.contains("not a directory")) {
            return "a part of the path is a file, not a folder";
        }
        if (text.contains("input/output error")) {
            return "the disk reported an input/output error";
        }
        return system != null ? system : failure.getClass().getSimpleName();
    }
}
