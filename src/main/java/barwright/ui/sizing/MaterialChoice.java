package barwright.ui.sizing;

import barwright.model.Material;
import barwright.model.MaterialLibrary;

import javax.swing.JCheckBox;
import javax.swing.JPanel;
import java.awt.GridLayout;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Which materials to try: each bar's own, and any of the built-in library, as tick boxes. Event thread. */
final class MaterialChoice extends JPanel {
    private final JCheckBox own;
    private final Map<Material, JCheckBox> library = new LinkedHashMap<>();

    /**
     * @param name     a stem for the boxes' names, e.g. "search" gives "search.ownMaterial"
     * @param ownWords the first box's words, e.g. "Each bar's own material"
     */
    MaterialChoice(String name, String ownWords) {
        super(new java.awt.BorderLayout());
        own = new JCheckBox(ownWords, true);
        setOpaque(false);
        own.setName(name + ".ownMaterial");
        own.setToolTipText("The material each bar has in the vehicle file");
        add(own, java.awt.BorderLayout.NORTH);
        JPanel others = new JPanel(new GridLayout(0, 2, 6, 0));
        others.setOpaque(false);
        add(others, java.awt.BorderLayout.CENTER);
        for (Material material : MaterialLibrary.all()) {
            JCheckBox box = new JCheckBox(material.name(), false);
            box.setName(name + ".material." + material.name());
            box.setToolTipText(String.format(java.util.Locale.ROOT, "Built-in: yield %.0f MPa, density %.0f kg/m³ "
                    + "(typical handbook values; a maker's certificate for the actual bar wins)",
                    material.yieldStrength() * 1e-6, material.density()));
            library.put(material, box);
            others.add(box);
        }
    }

    /** @return true where each bar's own material is ticked */
    boolean ownTicked() {
        return own.isSelected();
    }

    /** @return the library materials ticked, in the library's order */
    List<Material> libraryTicked() {
        return library.entrySet().stream().filter(e -> e.getValue().isSelected()).map(Map.Entry::getKey).toList();
    }

    /** Says what "own" is for the car as it stands. */
    void describeOwn(String words) {
        own.setToolTipText(words);
    }
}
