package barwright.io;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;

/**
 * Makes a directory unwritable: by its permissions, or where they do not bind (the tests run as root on
 * some machines) by the file system's immutable flag. Neither working is a failure, never a skip.
 */
record DirectoryLock(Path directory, boolean immutable) {
    static DirectoryLock lock(Path directory) throws IOException, InterruptedException {
        Files.setPosixFilePermissions(directory, PosixFilePermissions.fromString("r-xr-xr-x"));
        if (!canCreateIn(directory)) {
            return new DirectoryLock(directory, false);
        }
        Process chattr = new ProcessBuilder("chattr", "+i", directory.toString()).redirectErrorStream(true).start();
        String output = new String(chattr.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        if (chattr.waitFor() != 0 || canCreateIn(directory)) {
            throw new AssertionError("cannot make a directory unwritable here (permissions do not bind and "
                    + "chattr +i failed: " + output.strip() + "); the atomic-save test needs one");
        }
        return new DirectoryLock(directory, true);
    }

    private static boolean canCreateIn(Path directory) {
        try {
            Files.delete(Files.createTempFile(directory, "probe", ".tmp"));
            return true;
        } catch (IOException refused) {
            return false;
        }
    }

    void release() throws IOException, InterruptedException {
        if (immutable) {
            new ProcessBuilder("chattr", "-i", directory.toString()).start().waitFor();
        }
        Files.setPosixFilePermissions(directory, PosixFilePermissions.fromString("rwxr-xr-x"));
    }
}
