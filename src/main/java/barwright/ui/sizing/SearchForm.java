package barwright.ui.sizing;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.MassProperties;
import barwright.report.sheet.SheetContent;
import barwright.report.sizing.ReachText;
import barwright.sizing.ShareReach;
import barwright.sizing.SizingRequest;
import barwright.ui.panel.WrappingText;
import barwright.ui.task.BackgroundWork;
import barwright.ui.field.ViewSettings;
import barwright.units.Constants;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JCheckBox;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JRadioButton;
import javax.swing.JSpinner;
import javax.swing.SpinnerNumberModel;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
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
    /** What the bars reach on the car, and why the default target was moved where it was. */
    private final WrappingText reachNote = new WrappingText(" ");
    private final BackgroundWork<ReachInput, SearchPlan.Reach> reachWork;
    private final ViewSettings view;
    /** True once a person has typed a target or chosen how to aim: the form then never moves it. */
    private boolean targetChosen;
    /** True while the form itself sets the target, so that its own edits do not count as a person's. */
    private boolean settingDefault;
    private Vehicle lastCar;

    SearchForm(ViewSettings view) {
        setName("search.form");
        this.view = view;
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
        reachNote.setName("search.reach");
        reachWork = BackgroundWork.newestOnly(input -> SearchPlan.reach(input.vehicle(), input.settings()),
                this::showReach, failure -> showReach(null));
        watchForAPersonsTarget();
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
        across(indented(reachNote));
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

    /**
     * Says which material "own" means for the car as it stands, and works out (off the event thread) which front
     * shares the bars reach on it: a default target out of reach is moved just inside, and said so.
     */
    void showCar(Vehicle vehicle) {
        lastCar = vehicle;
        requestReach();
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

    private static javax.swing.JComponent indented(javax.swing.JComponent component) {
        component.setBorder(BorderFactory.createEmptyBorder(0, 26, 2, 0));
        return component;
    }

    /** A person's typing or choosing of the target stops the form from moving it (the form's own edits do not). */
    private void watchForAPersonsTarget() {
        DocumentListener typed = new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent event) {
                chosen();
            }

            @Override
            public void removeUpdate(DocumentEvent event) {
                chosen();
            }

            @Override
            public void changedUpdate(DocumentEvent event) {
                chosen();
            }
        };
        share.getDocument().addDocumentListener(typed);
        offset.getDocument().addDocumentListener(typed);
        shareItself.addActionListener(event -> chosen());
        shareOffset.addActionListener(event -> chosen());
        aimShare.addActionListener(event -> chosen());
        axle.addActionListener(event -> requestReach());
    }

    private void chosen() {
        if (!settingDefault) {
            targetChosen = true;
        }
    }

    /** Works out the reach of the bars as the form would search them now (where its settings can be read). */
    private void requestReach() {
        if (lastCar == null) {
            return;
        }
        try {
            reachWork.submit(new ReachInput(lastCar, settings()));
        } catch (IllegalArgumentException unreadable) {
            reachNote.setText(" "); // a field half typed: its message comes when the search is asked for
        }
    }

    /** What the reach is worked out for: the car and the form's settings as they stood. */
    private record ReachInput(Vehicle vehicle, SearchSettings settings) {
    }

    /**
     * Moves a default target out of reach just inside the reach (a person's target stays as typed) and says
     * what the bars reach; with no answer, says nothing.
     */
    private void showReach(SearchPlan.Reach answer) {
        if (answer == null || answer.reach() == null) {
            reachNote.setText(" ");
            return;
        }
        Locale locale = view.locale();
        ShareReach reach = answer.reach();
        String bars = answer.axles().size() > 1 ? "front and rear bars" : answer.axles().get(0).key() + " bar";
        String range = "Reachable with the " + bars + " on this car: " + ReachText.range(reach, locale) + ".";
        if (targetChosen) {
            reachNote.setText(range);
            return;
        }
        double wanted = answer.staticFront() + SheetContent.RULE_OF_THUMB_OFFSET;
        settingDefault = true;
        try {
            aimShare.setSelected(true);
            if (reach.contains(wanted)) {
                shareOffset.setSelected(true);
                offset.setValue(SheetContent.RULE_OF_THUMB_OFFSET);
                reachNote.setText(range);
            } else {
                double aim = Math.round(reach.aimFor(wanted) * 1000) / 1000.0; // a tenth of a point
                shareItself.setSelected(true);
                share.setValue(aim);
                String words = ReachText.outOfReach(bars, answer.staticFront(), wanted, reach, locale);
                reachNote.setText(Character.toUpperCase(words.charAt(0)) + words.substring(1) + "; aiming at "
                        + ReachText.percent(aim, locale) + ".");
            }
        } finally {
            settingDefault = false;
        }
    }

    /** @return true where no reach is being worked out */
    boolean reachSettled() {
        return reachWork.isIdle();
    }

    String reachText() {
        return reachNote.getText();
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
