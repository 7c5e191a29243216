package barwright.io;

/**
 * One thing wrong with a vehicle file.
 *
 * @param path    the key path, e.g. {@code front.bar.section.wallMm} or {@code front.bar.armLengthsMm[1]};
 *                empty for the file as a whole
 * @param message what is wrong and what is allowed, e.g. {@code = 14 mm: must be less than half of ...}
 */
public record Problem(String path, String message) {
    @Override
    public String toString() {
        return path.isEmpty() ? message : path + " " + message;
    }
}
