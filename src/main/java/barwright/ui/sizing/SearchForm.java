package barwright.ui.sizing;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.MassProperties;
import barwright.report.sheet.SheetContent;
import barwright.sizing.SizingRequest;
import barwright.ui.field.ViewSettings;
import barwright.units.Constants;
import barwright.units.Quantity;

import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JRadioButton;
import javax.swing.JSpinner;
import javax.swing.SpinnerNumberModel;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The settings of a sizing search: which bar, what to aim at, what must hold, what to try. Event thread. */
final class SearchForm extends Rows {
    private final JComboBox<String> axle = new JComboBox<>(new String[]{"front bar", "rear bar", "both bars"});
    private final JCheckBox aimShare = new JCheckBox("Front share of the lateral load transfer", true);
    private final JRadioButton shareItself = new JRadioButton("a front share of", false);
    private final JRadioButton shareOffset = new JRadioButton("the static front weight plus", true);
    private final QuantityField share;
    private final QuantityField offset;
    private final JCheckBox aimGradient = new JCheckBox("Roll gradient of", false);
    private final QuantityField gradient;
    private final QuantityField safety;
    private final JCheckBox frontDown = new JCheckBox("Inside front wheel stays down up to the limit");
    private final JCheckBox rearDown = new JCheckBox("Inside rear wheel stays down up to the limit");
    private final QuantityField maxMass;
    private final QuantityField maxDiameter;
    private final MaterialChoice materials = new MaterialChoice("search", "Each bar's own material");
    private final CatalogueChoice catalogues = new CatalogueChoice("search", id -> true);
    private final QuantityField tubeDiameter;
    private final JSpinner count = new JSpinner(new SpinnerNumberModel(SizingRequest.DEFAULT_MAX_RESULTS, 1, 100, 1));
    private final JButton search = new JButton("Find bars");

    SearchForm(ViewSettings view) {
        setName("search.form");
        share = new QuantityField("search.share", "Front share aimed at", Quantity.SHARE, view, 0.01, 0.99, 0.68, false);
        offset = new QuantityField("search.offset", "Points above the static front weight", Quantity.SHARE, view, -0.5,
                0.5, SheetContent.RULE_OF_THUMB_OFFSET, false);
        offset.setUnitText("points");
        offset.setToolTipText("A rule of thumb puts the front share about 5 points above the static front weight "
                + "for a slight understeer (from memory of Milliken & Milliken, Race Car Vehicle Dynamics)");
        double perG = Constants.RADIANS_PER_DEGREE / Constants.STANDARD_GRAVITY;
        gradient = new QuantityField("search.gradient", "Roll gradient aimed at", Quantity.ROLL_GRADIENT, view,
                0.05 * perG, 20 * perG, 1.5 * perG, false);
        safety = new QuantityField("search.safety", "Least safety factor", Quantity.RATIO, view, 0, 20, 1.5, false);
        safety.setToolTipText("Static, against yield, at the check travel of the vehicle file (Car page); a bar "
                + "cycled for a season needs a fatigue margin on top");
        maxMass = new QuantityField("search.maxMass", "Heaviest bar", Quantity.MASS, view, 0.01, 100, null, true);
        maxDiameter = new QuantityField("search.maxDiameter", "Largest outside diameter", Quantity.LENGTH, view,
                3e-3, 200e-3, null, true);
        tubeDiameter = new QuantityField("search.tubeDiameter", "Tube outside diameter for the exact wall",
                Quantity.LENGTH, view, 3e-3, 200e-3, null, true);
        tubeDiameter.setToolTipText("Give a tube's outside diameter to have the exact wall worked out for the "
                + "target (optional)");
        axle.setName("search.axle");
        aimShare.setName("search.aimShare");
        shareItself.setName("search.shareItself");
        shareOffset.setName("search.shareOffset");
        aimGradient.setName("search.aimGradient");
        frontDown.setName("search.frontStaysDown");
        rearDown.setName("search.rearStaysDown");
        count.setName("search.count");
        search.setName("search.run");
        ButtonGroup shareKind = new ButtonGroup();
        shareKind.add(shareItself);
        shareKind.add(shareOffset);
        layoutForm();
    }

    private void layoutForm() {
        heading("Which bar");
        line("Size the", axle, null);
        heading("Aim at");
        across(aimShare);
        across(inLine(22, shareOffset, offset, offset.unitLabel()));
        across(inLine(22, shareItself, share, share.unitLabel()));
        across(inLine(0, aimGradient, gradient, gradient.unitLabel()));
        heading("Every result must have");
        line("Least safety factor", safety);
        across(frontDown);
        across(rearDown);
        line("Heaviest bar", maxMass);
        line("Largest outside diameter", maxDiameter);
        across(new JLabel("<html><small>Leave a limit empty for none.</small></html>"));
        heading("Try");
        across(materials);
        across(new JLabel("Stock sizes from"));
        across(catalogues);
        line("Exact wall for a tube of", tubeDiameter);
        line("Results to list", count, null);
        end();
    }

    /** Says which material "own" means for the car as it stands. */
    void showCar(Vehicle vehicle) {
        List<String> own = new ArrayList<>();
        for (AxlePosition position : AxlePosition.values()) {
            if (vehicle.axle(position).bar() != null) {
                own.add(position.key() + ": " + vehicle.axle(position).bar().material().name());
            }
        }
        materials.describeOwn(own.isEmpty() ? "The car has no bar" : String.join("; ", own));
        String rule = "a rule of thumb puts the front share about 5 points above the static front weight for a "
                + "slight understeer (from memory of Milliken & Milliken, Race Car Vehicle Dynamics)";
        try {
            offset.setToolTipText(String.format(Locale.ROOT, "The static front weight is %.1f %%; ", 100
                    * MassProperties.of(vehicle).frontMassFraction()) + rule);
        } catch (ImpossibleVehicleException impossible) {
            // a mass half typed can make the car impossible for a moment; the main window says why
            offset.setToolTipText("The static front weight cannot be worked out for this car; " + rule);
        }
    }

    /**
     * @return the settings as typed
     * @throws IllegalArgumentException naming the field, the value and the allowed range
     */
    SearchSettings settings() {
        List<AxlePosition> axles = switch (axle.getSelectedIndex()) {
            case 0 -> List.of(AxlePosition.FRONT);
            case 1 -> List.of(AxlePosition.REAR);
            default -> List.of(AxlePosition.FRONT, AxlePosition.REAR);
        };
        SearchSettings.ShareAim aim = !aimShare.isSelected() ? SearchSettings.ShareAim.NONE
                : shareItself.isSelected() ? SearchSettings.ShareAim.SHARE : SearchSettings.ShareAim.OFFSET_FROM_STATIC;
        Double shareValue = switch (aim) {
            case NONE -> null;
            case SHARE -> share.value();
            case OFFSET_FROM_STATIC -> offset.value();
        };
        return new SearchSettings(axles, aim, shareValue, aimGradient.isSelected() ? gradient.value() : null,
                safety.value(), frontDown.isSelected(), rearDown.isSelected(), maxMass.value(), maxDiameter.value(),
                materials.ownTicked(), materials.libraryTicked(), catalogues.chosen(), tubeDiameter.value(),
                (Integer) count.getValue());
    }

    JButton searchButton() {
        return search;
    }

    JComboBox<String> axleChoice() {
        return axle;
    }
}
