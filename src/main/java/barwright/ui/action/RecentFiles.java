package barwright.ui.action;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

/** The files opened or saved last, newest first, kept in the settings. */
public final class RecentFiles {
    static final int MAX = 8;
    private static final String KEY = "recentFiles";
    private static final String SEPARATOR = "\n";
    private final Settings settings;

    public RecentFiles(Settings settings) {
        this.settings = settings;
    }

    public List<Path> list() {
        List<Path> files = new ArrayList<>();
        for (String line : settings.get(KEY, "").split(SEPARATOR)) {
            if (!line.isBlank()) {
                files.add(Path.of(line));
            }
        }
        return files;
    }

    /** Puts a file at the top of the list. */
    public void add(Path file) {
        Path absolute = file.toAbsolutePath().normalize();
        List<Path> files = list();
        files.remove(absolute);
        files.add(0, absolute);
        store(files.subList(0, Math.min(MAX, files.size())));
    }

    /** Takes a file off the list (it could not be opened). */
    public void remove(Path file) {
        List<Path> files = list();
        files.remove(file.toAbsolutePath().normalize());
        store(files);
    }

    private void store(List<Path> files) {
        settings.put(KEY, String.join(SEPARATOR, files.stream().map(Path::toString).toList()));
    }
}
