package barwright.ui.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.SolidSection;
import barwright.model.Vehicle;
import barwright.physics.bar.BarResult;
import barwright.sizing.BarChoice;
import barwright.io.VehicleFileException;
import barwright.report.sizing.TubeOutput;
import barwright.sizing.FatigueLap;
import barwright.sizing.TubeEquivalents;
import barwright.sizing.TubeLives;
import barwright.sizing.TubeMatch;
import barwright.ui.document.DocumentEvent;
import barwright.ui.panel.FigureFormat;
import barwright.ui.panel.WrappingText;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.ButtonGroup;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JRadioButton;
import javax.swing.JScrollPane;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.List;

/**
 * Tube or solid: for the car's solid bar (or a solid bar of a given diameter in its place) the catalogue tubes
 * within 2 % of its rate, lightest first, with the mass saved, both bars' stress at the check travel and their
 * fatigue life on the default lap; the
 * chosen tube can be put in the car as one undoable edit. Event thread.
 */
final class TubeView extends JPanel {
    /**
     * The tube, then what a choice turns on (mass, safety, life: in view even on a small screen with large text), then
     * its material, what it saves and how the rate and stress compare.
     */
    static final String[] COLUMNS = {"Tube", "Mass", "Safety", "Fatigue life", "Material", "Mass saved",
        "Rate vs solid", "Link rate", "Stress", "Stress vs solid"};
    static final int MASS = 1;
    static final int SAFETY = 2;
    static final int LIFE = 3;
    static final int MATERIAL = 4;
    static final int RATE_DIFFERENCE = 6;
    static final String[] HELP = {"The tube as the catalogue names it", "The tube's mass",
        "Static safety factor against yield at the check travel",
        "Laps to failure on the default lap (invented: 12 corners up to 1.2 g), the tube in the car; "
                + "\"no damage\": no cycle reaches the endurance limit",
        "The tube's material",
        "The solid bar's mass less the tube's, and as a share of the solid's",
        "The tube's rate over the solid bar's, less one",
        "Force per unit of relative link travel at the same hole",
        "Largest von Mises stress at the check travel",
        "The tube's largest stress over the solid bar's, less one"};
    private final SizingContext context;
    private final FigureFormat format;
    private final JComboBox<String> axle = new JComboBox<>(new String[]{"front bar", "rear bar"});
    private final JRadioButton own = new JRadioButton("the car's own bar", true);
    private final JRadioButton given = new JRadioButton("a solid bar in its place of", false);
    private final QuantityField diameter;
    private final MaterialChoice materials = new MaterialChoice("tubes", "The bar's own material");
    private final CatalogueChoice catalogues = new CatalogueChoice("tubes", id -> id.startsWith("tube"));
    private final JButton find = new JButton("Find tubes");
    private final JButton apply = new JButton("Put the chosen tube in the car");
    private final WrappingText solid = new WrappingText("Choose the solid bar to match and press Find tubes.");
    private final WrappingText applied = new WrappingText(" ");
    private final WorkStrip work = new WorkStrip("tubes");
    private final Rows rows = new Rows();
    private final Model model = new Model();
    private final FigureTable table;
    /** The settings beside the results, or the two as tabs where the window is narrow for its text. */
    private final SettingsBeside layout;
    private Found shown;

    /** A finished match, with where it was made. */
    private record Found(Vehicle vehicle, AxlePosition axle, TubeEquivalents.Comparison comparison,
                         TubeLives lives) {
    }

    TubeView(SizingContext context) {
        super(new BorderLayout());
        setName("tubes.view");
        this.context = context;
        this.format = new FigureFormat(context.view());
        diameter = new QuantityField("tubes.diameter", "Solid bar diameter", Quantity.LENGTH, context.view(), 3e-3,
                200e-3, 22e-3, false);
        axle.setName("tubes.axle");
        own.setName("tubes.own");
        given.setName("tubes.given");
        find.setName("tubes.find");
        apply.setName("tubes.apply");
        solid.setName("tubes.solid");
        applied.setName("tubes.applied");
        ButtonGroup which = new ButtonGroup();
        which.add(own);
        which.add(given);
        FigureTable figures = new FigureTable("tubes.results", model, HELP,
                new int[]{90, 50, 50, 80, 90, 80, 70, 70, 70, 70});
        figures.fitColumnsToTexts(); // short headers, each column as wide as its texts: the safety factor in view
        table = figures;
        table.getSelectionModel().addListSelectionListener(event -> refreshApply());
        find.addActionListener(event -> find());
        apply.setToolTipText("Writes the chosen tube and its material into the open car (same hole); Edit > Undo "
                + "takes it back");
        apply.addActionListener(event -> applyChosen());

        rows.heading("Solid bar to match");
        rows.line("The", axle, null);
        rows.across(Rows.inLine(0, own));
        rows.across(Rows.inLine(0, given, diameter, diameter.unitLabel()));
        rows.heading("Tubes to try");
        rows.across(materials);
        rows.across(catalogues);
        rows.across(new JLabel("<html><small>Equal rate: within 2 % of the solid bar's.</small></html>"));
        rows.end();
        JPanel left = new JPanel(new BorderLayout());
        left.add(SettingsBeside.settingsScroll(rows, 400), BorderLayout.CENTER);
        JPanel run = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 4));
        run.add(find); // outside the scrolled settings: always in view
        left.add(run, BorderLayout.SOUTH);

        JPanel results = new JPanel(new BorderLayout(0, 4));
        results.setBorder(BorderFactory.createEmptyBorder(6, 8, 4, 8));
        results.add(solid, BorderLayout.NORTH);
        results.add(new JScrollPane(table), BorderLayout.CENTER);
        JPanel under = new JPanel(new BorderLayout(0, 4));
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        buttons.add(apply);
        under.add(new WrappingText("A tube of the same rate stresses more than the solid bar: check its safety "
                + "factor, and that its ends and splines can be made in that wall."), BorderLayout.NORTH);
        under.add(buttons, BorderLayout.CENTER);
        under.add(applied, BorderLayout.SOUTH);
        results.add(under, BorderLayout.SOUTH);
        layout = new SettingsBeside("tubes", left, results);
        add(layout, BorderLayout.CENTER);
        add(work, BorderLayout.SOUTH);
        axle.addActionListener(event -> describeOwn());
        context.document().addListener(this::documentChanged);
        context.view().addListener(() -> {
            model.fireTableDataChanged();
            describe();
        });
        describeOwn();
        refreshApply();
    }

    private void documentChanged(DocumentEvent event) {
        describeOwn();
        if (event.kind() == DocumentEvent.Kind.REPLACED && shown != null) {
            shown = null;
            model.fireTableDataChanged();
            applied.setText(" ");
            solid.setText("Another car was opened: " + context.document().displayName() + ". The tubes found for the "
                    + "car before it were cleared; press Find tubes to look again.");
        }
        describe();
        refreshApply();
    }

    private AxlePosition chosenAxle() {
        return axle.getSelectedIndex() == 0 ? AxlePosition.FRONT : AxlePosition.REAR;
    }

    /** Says what the car's own bar is, and offers it only where it is solid. */
    private void describeOwn() {
        if (!context.document().isValid()) {
            return;
        }
        AntiRollBar bar = context.document().lastValid().vehicle().axle(chosenAxle()).bar();
        boolean solidBar = bar != null && bar.section() instanceof SolidSection;
        own.setText(bar == null ? "the car's own bar (there is none)"
                : solidBar ? "the car's own bar: " + format.text(bar.section().outerDiameter(), Quantity.LENGTH)
                + " solid, " + bar.material().name()
                : "the car's own bar (a tube: give a solid diameter instead)");
        own.setEnabled(solidBar);
        if (!solidBar) {
            given.setSelected(true);
        }
    }

    void find() {
        Vehicle vehicle;
        AntiRollBar solidBar;
        List<String> names;
        List<Material> tried;
        FatigueLap lap;
        AxlePosition position = chosenAxle();
        try {
            vehicle = context.currentCar().vehicle();
            lap = FatigueLap.onDefaultLap(context.currentCar());
            AntiRollBar bar = vehicle.axle(position).bar();
            if (bar == null) {
                throw new IllegalArgumentException("The " + position.key() + " axle has no bar to match: give it one "
                        + "in the main window first.");
            }
            solidBar = own.isSelected() ? bar : bar.withSection(new SolidSection(diameter.value()));
            if (!(solidBar.section() instanceof SolidSection)) {
                throw new IllegalArgumentException("The " + position.key() + " bar is a tube: give the diameter of "
                        + "the solid bar to match.");
            }
            tried = SearchPlan.materials(materials.ownTicked(), materials.libraryTicked(), bar);
            names = catalogues.chosen();
            SearchPlan.sizes(names);
        } catch (IllegalArgumentException | IllegalStateException | VehicleFileException refused) {
            work.say(refused.getMessage(), true);
            return;
        }
        AntiRollBar matched = solidBar;
        work.run("Trying the tubes", "tubes", "The tubes could not be tried", progress -> {
            TubeEquivalents.Comparison comparison = TubeEquivalents.compare(matched, vehicle.differentialWheelTravel(),
                    SearchPlan.sizes(names), tried, TubeEquivalents.DEFAULT_TOLERANCE);
            return new Found(vehicle, position, comparison, TubeLives.of(vehicle, position, comparison, lap));
        }, found -> {
            shown = found;
            model.fireTableDataChanged();
            layout.showResults();
            if (model.getRowCount() > 0) {
                table.setRowSelectionInterval(0, 0);
            }
            applied.setText(" ");
            describe();
            refreshApply();
        });
    }

    private void describe() {
        if (shown == null) {
            return;
        }
        AntiRollBar bar = shown.comparison().solidBar();
        BarResult result = shown.comparison().solid();
        String text = "Solid bar " + format.text(bar.section().outerDiameter(), Quantity.LENGTH) + " "
                + bar.material().name() + " on the " + shown.axle().key() + ", hole " + (bar.selectedArm() + 1)
                + ": link rate " + format.text(result.linkRate(), Quantity.LINEAR_RATE) + ", mass "
                + format.text(result.mass(), Quantity.MASS) + ", largest stress "
                + format.text(result.maxVonMisesStress(), Quantity.STRESS) + ", safety factor "
                + format.factor(result.safetyFactor()) + "; fatigue life on the default lap (invented): "
                + TubeOutput.lifeText(shown.lives().solid()) + ". "
                + (shown.comparison().matches().isEmpty() ? "No tube tried comes within 2 % of its rate."
                : shown.comparison().matches().size() + " tubes come within 2 % of its rate, lightest first.");
        if (!stillApplies()) {
            text += " The car has changed since: find the tubes again before using them.";
        }
        solid.setText(text);
    }

    private boolean stillApplies() {
        return shown != null && context.document().isValid()
                && context.document().lastValid().vehicle().equals(shown.vehicle());
    }

    private void applyChosen() {
        int row = table.getSelectedRow();
        if (row < 0 || !stillApplies()) {
            return;
        }
        TubeMatch match = shown.comparison().matches().get(table.convertRowIndexToModel(row));
        BarChoice choice = new BarChoice(shown.axle(), match.material(), match.size(),
                shown.comparison().solidBar().selectedArm());
        BarEdits.putBars(context.document(), List.of(choice), this);
        applied.setText("Put in the car: " + shown.axle().key() + " bar " + match.size().label() + " "
                + match.material().name() + ". Edit > Undo (Ctrl+Z) in the main window takes it back.");
    }

    private void refreshApply() {
        apply.setEnabled(table.getSelectedRow() >= 0 && stillApplies());
    }

    /** @return true where the settings and the results are two tabs (a narrow window for its text) */
    boolean settingsAndResultsTabbed() {
        return layout.tabbed();
    }

    WorkStrip work() {
        return work;
    }

    FigureTable table() {
        return table;
    }

    String solidText() {
        return solid.getText();
    }

    /** The tubes found, as rows in the units chosen. */
    private final class Model extends TextTableModel {
        Model() {
            super(COLUMNS);
        }

        @Override
        public int getRowCount() {
            return shown == null ? 0 : shown.comparison().matches().size();
        }

        @Override
        public Object getValueAt(int row, int column) {
            TubeMatch match = shown.comparison().matches().get(row);
            BarResult solidBar = shown.comparison().solid();
            var locale = context.view().locale();
            return switch (column) {
                case 0 -> match.size().label();
                case MASS -> format.text(match.mass(), Quantity.MASS);
                case SAFETY -> format.factor(match.safetyFactor());
                case LIFE -> TubeOutput.lifeText(shown.lives().tubes().get(row));
                case MATERIAL -> match.material().name();
                case 5 -> format.text(match.massSaved(), Quantity.MASS)
                        + String.format(locale, " (%.0f %%)", 100 * match.massSaved() / solidBar.mass());
                case RATE_DIFFERENCE -> String.format(locale, "%+.1f %%", match.rateDifference() * 100);
                case 7 -> format.text(match.linkRate(), Quantity.LINEAR_RATE);
                case 8 -> format.text(match.maxStress(), Quantity.STRESS);
                default -> String.format(locale, "%+.0f %%", 100 * (match.maxStress() / solidBar.maxVonMisesStress() - 1));
            };
        }
    }
}
