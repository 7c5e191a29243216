package barwright.ui.sizing;

import barwright.sizing.catalogue.Catalogues;

import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JFileChooser;
import javax.swing.JPanel;
import javax.swing.JTextField;
import java.awt.BorderLayout;
import java.awt.GridLayout;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Predicate;

/**
 * Which stock sizes to try: built-in catalogues as tick boxes, and a person's own catalogue file by path.
 * Event thread.
 */
final class CatalogueChoice extends JPanel {
    private final Map<String, JCheckBox> builtIn = new LinkedHashMap<>();
    private final JTextField ownFile = new JTextField(8);

    /**
     * @param name  a stem for the components' names, e.g. "search" gives "search.catalogue.tube-inch"
     * @param offer which built-in catalogues to offer, by name
     */
    CatalogueChoice(String name, Predicate<String> offer) {
        super(new BorderLayout(0, 2));
        setOpaque(false);
        JPanel boxes = new JPanel(new GridLayout(0, 2, 6, 0));
        boxes.setOpaque(false);
        for (String id : Catalogues.BUILT_IN) {
            if (offer.test(id)) {
                JCheckBox box = new JCheckBox(words(id), true);
                box.setName(name + ".catalogue." + id);
                builtIn.put(id, box);
                boxes.add(box);
            }
        }
        ownFile.setName(name + ".ownCatalogue");
        ownFile.setToolTipText("The path of a catalogue file of your stockist's sizes (docs/sizing.md gives its "
                + "format); leave empty for none");
        JButton choose = new JButton("Choose…");
        choose.setName(name + ".chooseCatalogue");
        choose.addActionListener(event -> choose());
        JPanel own = new JPanel(new BorderLayout(4, 0));
        own.setOpaque(false);
        own.add(new javax.swing.JLabel("and your own file"), BorderLayout.WEST);
        own.add(ownFile, BorderLayout.CENTER);
        own.add(choose, BorderLayout.EAST);
        add(boxes, BorderLayout.CENTER);
        add(own, BorderLayout.SOUTH);
    }

    /** @return the built-in names ticked, then the own file's path where one is given */
    List<String> chosen() {
        List<String> chosen = new ArrayList<>(builtIn.entrySet().stream().filter(e -> e.getValue().isSelected())
                .map(Map.Entry::getKey).toList());
        if (!ownFile.getText().isBlank()) {
            chosen.add(ownFile.getText().strip());
        }
        return chosen;
    }

    private void choose() {
        JFileChooser chooser = new JFileChooser();
        chooser.setDialogTitle("Choose a catalogue of stock sizes");
        chooser.setFileFilter(new javax.swing.filechooser.FileNameExtensionFilter("Catalogue files (*.json)", "json"));
        if (chooser.showOpenDialog(this) == JFileChooser.APPROVE_OPTION) {
            ownFile.setText(chooser.getSelectedFile().getPath());
        }
    }

    /** @return the catalogue's name for people */
    static String words(String id) {
        return switch (id) {
            case "solid-metric" -> "solid bar, metric";
            case "solid-inch" -> "solid bar, inch";
            case "tube-metric" -> "tube, metric";
            case "tube-inch" -> "tube, inch";
            default -> id;
        };
    }
}
