package barwright.sizing.catalogue;

import java.util.List;
import java.util.Objects;

/**
 * A list of stock sizes with the basis it stands on.
 *
 * @param id    how a person picks it: a built-in name such as "tube-inch", or the file's path
 * @param name  a title for people
 * @param basis what the sizes rest on: common practice, or the standard it follows
 * @param sizes the sizes, in the file's order
 */
public record Catalogue(String id, String name, String basis, List<StockSize> sizes) {
    public Catalogue {
        Objects.requireNonNull(id, "id");
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(basis, "basis");
        sizes = List.copyOf(sizes);
    }
}
