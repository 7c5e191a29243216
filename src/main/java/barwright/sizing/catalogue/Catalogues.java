package barwright.sizing.catalogue;

import barwright.io.Problem;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;

/**
 * The catalogues built into the program (resources under {@code barwright/catalogues/}), and picking one by
 * name or by the path of a user's own file.
 */
public final class Catalogues {
    /** The built-in catalogue names, in the order they are offered. */
    public static final List<String> BUILT_IN = List.of("solid-metric", "solid-inch", "tube-metric", "tube-inch");

    private Catalogues() {
    }

    /** @return every built-in catalogue */
    public static List<Catalogue> builtIn() {
        List<Catalogue> all = new ArrayList<>();
        for (String name : BUILT_IN) {
            all.add(builtIn(name).orElseThrow());
        }
        return all;
    }

    /** @return the built-in catalogue of that name */
    public static Optional<Catalogue> builtIn(String name) {
        if (!BUILT_IN.contains(name)) {
            return Optional.empty();
        }
        String resource = "/barwright/catalogues/" + name + ".json";
        try (InputStream in = Catalogues.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("the built-in catalogue " + resource + " is missing from the program");
            }
            return Optional.of(CatalogueReader.parse(name, in.readAllBytes()));
        } catch (IOException unreadable) {
            throw new UncheckedIOException(unreadable);
        } catch (CatalogueFileException broken) {
            throw new IllegalStateException("the built-in catalogue " + name + " is broken: " + broken.getMessage(),
                    broken);
        }
    }

    /**
     * @param nameOrPath a built-in name, or the path of a catalogue file
     * @throws CatalogueFileException where it is neither, or the file is refused
     */
    public static Catalogue find(String nameOrPath) throws CatalogueFileException {
        Optional<Catalogue> builtIn = builtIn(nameOrPath);
        if (builtIn.isPresent()) {
            return builtIn.get();
        }
        Path path = Path.of(nameOrPath);
        if (!Files.exists(path)) {
            throw new CatalogueFileException(List.of(new Problem("", "no catalogue '" + nameOrPath
                    + "': give a built-in one (" + String.join(", ", BUILT_IN) + ") or the path of a catalogue file")));
        }
        return CatalogueReader.read(path);
    }
}
