package barwright.sizing.catalogue;

import barwright.model.BarSection;

import java.util.Objects;

/**
 * A section that can be bought: its label as a stockist writes it, and its dimensions in SI.
 *
 * @param label   e.g. "22 mm" or "1 in x 0.083 in (14 BWG)"
 * @param section the section
 */
public record StockSize(String label, BarSection section) {
    public StockSize {
        Objects.requireNonNull(label, "label");
        Objects.requireNonNull(section, "section");
    }
}
