package barwright.ui.panel;

import barwright.io.KeyPath;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.ui.document.OpenDocument;
import barwright.ui.fatigue.BarLifeView;
import barwright.ui.field.FieldCatalogue;
import barwright.ui.field.NumberText;
import barwright.ui.field.ViewSettings;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.IntNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;

import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import java.util.ArrayList;
import java.util.List;

import static barwright.io.VehicleKeys.DENSITY_KG_PER_M3;
import static barwright.io.VehicleKeys.MATERIAL;
import static barwright.io.VehicleKeys.OUTER_DIAMETER_MM;
import static barwright.io.VehicleKeys.SECTION;
import static barwright.io.VehicleKeys.SELECTED_ARM;
import static barwright.io.VehicleKeys.SHAPE;
import static barwright.io.VehicleKeys.SHEAR_MODULUS_GPA;
import static barwright.io.VehicleKeys.SOLID;
import static barwright.io.VehicleKeys.WALL_MM;
import static barwright.io.VehicleKeys.YIELD_STRENGTH_MPA;
import static barwright.io.VehicleKeys.YOUNGS_MODULUS_GPA;

/** One axle's anti-roll bar: fitted or not, material, section, lengths, arm holes and the link. */
final class BarPage extends EditorPage {
    /** The material choice for values of your own (short: the choice keeps its width at a large text). */
    static final String CUSTOM = "Your own values";
    private final AxlePosition axle;
    private final String bar;
    private JsonNode removedBar;
    private final BarLifeView life;

    BarPage(OpenDocument document, ViewSettings view, AxlePosition axle) {
        super(document, view);
        this.axle = axle;
        this.bar = axle.key() + ".bar";
        this.life = new BarLifeView(document, view, axle);
        rebuild();
    }

    @Override
    protected String shape() {
        if (!isObject(bar)) {
            return "none";
        }
        return String.join("|", customMaterial() ? "custom" : libraryName() + " " + view.units(), text(bar + ".section.shape"),
                String.valueOf(holeCount()), String.valueOf(isObject(bar + ".geometry")),
                String.valueOf(has(bar + ".torsionLengthMm")));
    }

    @Override
    protected void build(Form form) {
        // a short box text beside a label that wraps: the page keeps its width at a large text
        JCheckBox fitted = new JCheckBox("Fitted on this axle", isObject(bar));
        fitted.setName(bar + ".fitted");
        fitted.setToolTipText("Clear it to take the bar off this axle (the file keeps no bar here); tick it to put "
                + "one back");
        fitted.addActionListener(event -> setFitted(fitted.isSelected()));
        form.field("Anti-roll bar", fitted, null, null);
        if (!isObject(bar)) {
            form.note(new WrappingText("No " + axle.key() + " bar: only the springs and tyres resist roll at this "
                    + "end."));
            return;
        }
        material(form);
        section(form);
        if (isObject(bar + ".geometry")) {
            WrappingText shaped = new WrappingText("Shaped bar: its bent centreline, bushing positions and "
                    + "hole set-backs are kept as the file gives them and solved with beam elements. They are "
                    + "not edited here; section, material, hole in use and link are.");
            shaped.setName(bar + ".shaped");
            form.note(shaped);
        }
        if (has(bar + ".torsionLengthMm") || !isObject(bar + ".geometry")) {
            form.group("Lengths, measured on the bar");
            fields(form, bar, FieldCatalogue.BAR_LENGTHS);
            holes(form);
        }
        form.group("Link to the suspension");
        form.field(new NumberField(document, view, KeyPath.of(bar).child("linkMotionRatio"),
                FieldCatalogue.LINK_RATIO));
        selectedHole(form);
        form.group("Fatigue life");
        form.note(life);
    }

    private void material(Form form) {
        form.group("Material");
        JComboBox<String> choice = new JComboBox<>();
        MaterialLibrary.names().forEach(choice::addItem);
        choice.addItem(CUSTOM);
        choice.setName(bar + ".material");
        choice.setSelectedItem(customMaterial() ? CUSTOM : libraryName());
        choice.setToolTipText(Tooltips.wrap("A material from the built-in list (typical handbook values), or "
                + "your own values from the bar maker's certificate.", 300));
        choice.addActionListener(event -> chooseMaterial((String) choice.getSelectedItem()));
        form.field("Material", choice, null, null);
        if (customMaterial()) {
            form.field("Material name", new TextValueField(document, KeyPath.of(bar + ".material.name"),
                    "A label for the material, e.g. as on the maker's certificate."), null, null);
            fields(form, bar + ".material", FieldCatalogue.MATERIAL);
        } else {
            MaterialLibrary.byName(libraryName()).ifPresent(material -> {
                WrappingText values = new WrappingText(describe(material));
                values.setName(bar + ".material.values");
                form.note(values);
            });
        }
    }

    private String describe(Material material) {
        var units = view.units();
        var locale = view.locale();
        return "E " + Figures.format(material.youngsModulus(), Quantity.MODULUS, units, 1, locale)
                + ", G " + Figures.format(material.shearModulus(), Quantity.MODULUS, units, 1, locale)
                + ", density " + Figures.format(material.density(), Quantity.DENSITY, units,
                units == UnitSystem.US ? 3 : 0, locale)
                + ", yield " + Figures.format(material.yieldStrength(), Quantity.STRESS, units, 0, locale)
                + " (typical values; the maker's certificate wins)";
    }

    private void section(Form form) {
        form.group("Section");
        JComboBox<String> shape = new JComboBox<>(new String[]{"Solid round", "Tube"});
        shape.setName(bar + ".section.shape");
        shape.setSelectedIndex("tube".equals(text(bar + ".section.shape")) ? 1 : 0);
        shape.setToolTipText(Tooltips.wrap("Solid round bar, or a tube (lighter for the same rate, but its "
                + "wall sets its strength).", 300));
        shape.addActionListener(event -> chooseShape(shape.getSelectedIndex() == 1));
        form.field("Shape", shape, null, null);
        form.field(new NumberField(document, view, KeyPath.of(bar + "." + SECTION).child(OUTER_DIAMETER_MM),
                FieldCatalogue.DIAMETER));
        if ("tube".equals(text(bar + ".section.shape"))) {
            form.field(new NumberField(document, view, KeyPath.of(bar + "." + SECTION).child(WALL_MM),
                    FieldCatalogue.WALL));
        }
    }

    private void holes(Form form) {
        int count = holeCount();
        for (int hole = 0; hole < count; hole++) {
            form.field(new NumberField(document, view, KeyPath.of(bar + ".armLengthsMm[" + hole + "]"),
                    FieldCatalogue.ARM.withKey("armLengthsMm[" + hole + "]", "Hole " + (hole + 1) + " arm length")));
        }
        JButton add = new JButton("Add a hole");
        add.setName(bar + ".addHole");
        add.setToolTipText("Add a link hole further out on the arms");
        add.addActionListener(event -> addHole());
        JButton remove = new JButton("Remove the last hole");
        remove.setName(bar + ".removeHole");
        remove.setEnabled(count > 1);
        remove.addActionListener(event -> removeHole());
        form.note(new ButtonRow(add, remove));
    }

    private void selectedHole(Form form) {
        int count = holeCount();
        List<String> names = new ArrayList<>();
        for (int hole = 0; hole < count; hole++) {
            // short, so that the choice keeps its width at a large text; the tip says which end is which
            names.add("Hole " + (hole + 1) + (hole == 0 ? " (innermost)" : ""));
        }
        JComboBox<String> choice = new JComboBox<>(names.toArray(String[]::new));
        choice.setName(bar + ".selectedArm");
        JsonNode selected = document.value(KeyPath.of(bar + ".selectedArm"));
        int index = selected != null && selected.canConvertToInt() ? selected.intValue() : 0;
        choice.setSelectedIndex(Math.max(0, Math.min(count - 1, index)));
        choice.setToolTipText(Tooltips.wrap("The hole the drop link is bolted to, counted from the innermost (nearest "
                + "the bar's axis). A hole nearer the axis (a shorter arm) makes the bar stiffer at the wheel.", 300));
        choice.addActionListener(event -> {
            if (choice.getSelectedIndex() >= 0) {
                document.edit(KeyPath.of(bar + ".selectedArm"), IntNode.valueOf(choice.getSelectedIndex()), null,
                        choice);
            }
        });
        form.field("Hole in use", choice, null, null);
    }

    private void setFitted(boolean fitted) {
        KeyPath path = KeyPath.of(bar);
        if (fitted && !isObject(bar)) {
            document.edit(path, removedBar != null ? removedBar : defaultBar(), null, this);
        } else if (!fitted && isObject(bar)) {
            removedBar = document.value(path).deepCopy();
            document.edit(path, null, null, this);
        }
    }

    /** A plain solid steel U-bar to start from when a bar is added where there was none. */
    private static ObjectNode defaultBar() {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.putObject(MATERIAL).put("name", MaterialLibrary.SPRING_STEEL.name());
        node.putObject(SECTION).put(SHAPE, SOLID).put(OUTER_DIAMETER_MM, 18);
        node.put("torsionLengthMm", 900);
        node.put("bushingSpanMm", 760);
        node.putArray("armLengthsMm").add(180).add(200).add(220);
        node.put(SELECTED_ARM, 1);
        node.put("linkMotionRatio", 0.8);
        return node;
    }

    private void chooseMaterial(String name) {
        if (name == null || (CUSTOM.equals(name) && customMaterial())
                || (!customMaterial() && name.equalsIgnoreCase(libraryName()))) {
            return;
        }
        KeyPath path = KeyPath.of(bar + ".material");
        if (CUSTOM.equals(name)) {
            Material base = currentMaterial();
            ObjectNode custom = JsonNodeFactory.instance.objectNode();
            custom.put("name", "custom " + base.name());
            custom.put(YOUNGS_MODULUS_GPA, NumberText.forFile(base.youngsModulus() / 1e9));
            custom.put(SHEAR_MODULUS_GPA, NumberText.forFile(base.shearModulus() / 1e9));
            custom.put(DENSITY_KG_PER_M3, NumberText.forFile(base.density()));
            custom.put(YIELD_STRENGTH_MPA, NumberText.forFile(base.yieldStrength() / 1e6));
            document.edit(path, custom, null, this);
        } else {
            document.edit(path, JsonNodeFactory.instance.objectNode().put("name", name), null, this);
        }
    }

    private Material currentMaterial() {
        var vehicleAxle = document.lastValid().vehicle().axle(axle);
        return vehicleAxle.hasBar() ? vehicleAxle.bar().material() : MaterialLibrary.SPRING_STEEL;
    }

    private void chooseShape(boolean tube) {
        boolean isTube = "tube".equals(text(bar + ".section.shape"));
        if (tube == isTube) {
            return;
        }
        document.editAll(tree -> {
            ObjectNode section = (ObjectNode) KeyPath.of(bar + "." + SECTION).get(tree);
            section.set("shape", TextNode.valueOf(tube ? "tube" : "solid"));
            if (tube) {
                JsonNode diameter = section.get(OUTER_DIAMETER_MM);
                double outside = diameter != null && diameter.isNumber() ? diameter.doubleValue() : 25;
                section.put(WALL_MM, NumberText.forFile(Math.min(3.0, outside / 6)));
            } else {
                section.remove(WALL_MM);
            }
        }, this);
    }

    private void addHole() {
        document.editAll(tree -> {
            var arms = (ArrayNode) KeyPath.of(bar + ".armLengthsMm").get(tree);
            JsonNode last = arms.get(arms.size() - 1);
            arms.add(last != null && last.isNumber() ? last.doubleValue() + 20 : 200);
        }, this);
    }

    private void removeHole() {
        document.editAll(tree -> {
            var arms = (ArrayNode) KeyPath.of(bar + ".armLengthsMm").get(tree);
            if (arms.size() > 1) {
                arms.remove(arms.size() - 1);
                ObjectNode barNode = (ObjectNode) KeyPath.of(bar).get(tree);
                JsonNode selected = barNode.get(SELECTED_ARM);
                if (selected != null && selected.canConvertToInt() && selected.intValue() >= arms.size()) {
                    barNode.put(SELECTED_ARM, arms.size() - 1);
                }
            }
        }, this);
    }

    private boolean customMaterial() {
        JsonNode material = document.value(KeyPath.of(bar + ".material"));
        return material != null && material.isObject() && !(material.size() == 1 && material.has("name"));
    }

    private String libraryName() {
        String name = text(bar + ".material.name");
        return MaterialLibrary.byName(name).map(Material::name).orElse(name);
    }

    private int holeCount() {
        JsonNode holes = document.value(KeyPath.of(isObject(bar + ".geometry") && !has(bar + ".torsionLengthMm")
                ? bar + ".geometry.holeSetbacksMm" : bar + ".armLengthsMm"));
        return holes != null && holes.isArray() ? Math.max(1, holes.size()) : 1;
    }

    private String text(String path) {
        JsonNode node = document.value(KeyPath.of(path));
        return node == null || node.isNull() ? "" : node.asText();
    }
}
