package barwright.ui.sizing;

import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.ui.document.DocumentEvent;
import barwright.ui.field.NumberText;
import barwright.ui.field.ViewSettings;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;

import javax.swing.BorderFactory;
import javax.swing.DefaultListModel;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JList;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextField;
import javax.swing.ListSelectionModel;
import javax.swing.SwingConstants;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;
import java.util.function.Consumer;

/**
 * Builds a variant of the open car from the fields a person knows: a quantity chosen from a list (the editor's
 * labels), its new value in the display unit (an arm hole picked from the bar's holes, counted from 1), each
 * change listed in words and removable. The changes go into the car through {@link VehicleLoader#withEdits}, which
 * checks each one as it is added, so a refused value is said at once with its field and allowed range. Event
 * thread.
 */
final class VariantBuilder extends JPanel {
    private final SizingContext context;
    private final Consumer<String> say;
    private final JComboBox<VariantChoices.Choice> what = new JComboBox<>();
    private final JTextField value = new JTextField(7);
    private final JLabel unit = new JLabel();
    private final JComboBox<String> hole = new JComboBox<>();
    private final DefaultListModel<String> shown = new DefaultListModel<>();
    private final JList<String> list = new JList<>(shown);
    private final List<VariantChange> pending = new ArrayList<>();
    private List<VariantChoices.Choice> choices = List.of();
    /** The unit system the value field's text is written in. */
    private UnitSystem textUnits;

    /**
     * @param say        shows a message (a refusal with true)
     * @param addVariant adds the variant with the changes listed (the compare view's action)
     */
    VariantBuilder(SizingContext context, Consumer<String> say, Runnable addVariant) {
        super(new BorderLayout(6, 2));
        this.context = context;
        this.say = say;
        setName("compare.variant");
        setBorder(BorderFactory.createTitledBorder("A variant of the open car"));
        what.setName("compare.what");
        what.setToolTipText("What the variant changes, under the labels of the editor's pages");
        what.setMaximumRowCount(20);
        value.setName("compare.value");
        value.setHorizontalAlignment(SwingConstants.RIGHT);
        value.getAccessibleContext().setAccessibleName("New value");
        value.addActionListener(event -> addChange());
        unit.setName("compare.value.unit");
        hole.setName("compare.hole");
        hole.setToolTipText("The hole the drop link goes to, counted from 1 (nearest the bar's axis) as in the "
                + "editor");
        list.setName("compare.changes");
        list.setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        list.setVisibleRowCount(3);
        what.addActionListener(event -> showChoice());

        // two rows, so that at a large text size nothing runs off the edge: what to change, then its new value
        JPanel choose = new JPanel(new GridBagLayout());
        GridBagConstraints at = new GridBagConstraints();
        at.insets = new Insets(2, 0, 2, 6);
        at.anchor = GridBagConstraints.WEST;
        choose.add(new JLabel("Change"), at);
        at.gridwidth = GridBagConstraints.REMAINDER;
        choose.add(what, at);
        at.gridwidth = 1;
        at.gridy = 1;
        choose.add(new JLabel("to"), at);
        JPanel newValue = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
        newValue.add(value);
        newValue.add(unit);
        newValue.add(hole);
        newValue.add(CompareView.button("compare.addChange", "Add this change", this::addChange));
        at.insets = new Insets(2, -6, 2, 0);
        choose.add(newValue, at);
        at.weightx = 1;
        choose.add(new JLabel(), at);
        add(choose, BorderLayout.NORTH);
        add(new JScrollPane(list), BorderLayout.CENTER);
        add(CompareView.column(
                CompareView.button("compare.removeChange", "Remove the chosen change", this::removeChosen),
                CompareView.button("compare.addVariant", "Add the variant", addVariant)), BorderLayout.EAST);

        WhileShown updates = new WhileShown(this, this::carChanged);
        context.document().addListener(event -> {
            if (event.kind() == DocumentEvent.Kind.REPLACED) {
                pending.clear(); // changes chosen for another car
            }
            updates.request();
        });
        context.view().addListener(this::unitsChanged);
        carChanged();
    }

    /** @return the changes listed, in the order added */
    List<VariantChange> pending() {
        return List.copyOf(pending);
    }

    /** Empties the list (the variant was added). */
    void clear() {
        pending.clear();
        refreshList();
    }

    /** @return the changes in words for the car as it stands, e.g. for the setup's "Where it came from" */
    String words(JsonNode tree) {
        return String.join("; ", pending.stream()
                .map(change -> change.words(tree, context.view().units(), context.view().locale())).toList());
    }

    /** Chooses what to change by its title, e.g. "Rear bar — Arm hole in use" (tests and the screenshot tool). */
    void choose(String title) {
        for (VariantChoices.Choice choice : choices) {
            if (choice.title().equals(title)) {
                what.setSelectedItem(choice);
                return;
            }
        }
        throw new IllegalArgumentException("no choice " + title + " for this car");
    }

    List<VariantChoices.Choice> choices() {
        return choices;
    }

    /** Offers the quantities of the car as it stands, keeping the one chosen where the car still has it. */
    private void carChanged() {
        JsonNode tree = context.document().lastValid().tree();
        String chosen = what.getSelectedItem() == null ? null : what.getSelectedItem().toString();
        List<VariantChoices.Choice> fresh = VariantChoices.of(tree);
        if (fresh.equals(choices)) {
            showChoice(); // the values may have changed
            refreshList();
            return;
        }
        choices = fresh;
        what.removeAllItems();
        choices.forEach(what::addItem);
        choices.stream().filter(choice -> choice.title().equals(chosen)).findFirst().ifPresent(what::setSelectedItem);
        showChoice();
        refreshList();
    }

    /** Shows the chosen quantity's value on the open car: its number in the display unit, or its holes. */
    private void showChoice() {
        VariantChoices.Choice choice = (VariantChoices.Choice) what.getSelectedItem();
        boolean isHole = choice != null && choice.isHole();
        value.setVisible(choice != null && !isHole);
        unit.setVisible(choice != null && !isHole);
        hole.setVisible(isHole);
        if (choice == null) {
            return;
        }
        JsonNode now = choice.path().get(context.document().lastValid().tree());
        UnitSystem units = context.view().units();
        if (isHole) {
            hole.removeAllItems();
            for (int index = 0; index < choice.holes().size(); index++) {
                hole.addItem(choice.holeText(index, units, context.view().locale()));
            }
            int selected = now != null && now.canConvertToInt() ? now.intValue() : 0;
            hole.setSelectedIndex(Math.max(0, Math.min(choice.holes().size() - 1, selected)));
        } else {
            textUnits = units;
            unit.setText(choice.spec().unitSymbol(units));
            value.setText(now != null && now.isNumber()
                    ? VariantChoices.number(choice.spec(), now.doubleValue(), units, context.view().locale()) : "");
            value.setToolTipText(choice.spec().help());
        }
        revalidate();
    }

    /** Keeps a typed value: it is written again in the new unit. */
    private void unitsChanged() {
        VariantChoices.Choice choice = (VariantChoices.Choice) what.getSelectedItem();
        UnitSystem units = context.view().units();
        if (choice != null && !choice.isHole() && textUnits != null && textUnits != units) {
            OptionalDouble typed = NumberText.parse(value.getText(), context.view().locale());
            if (typed.isPresent()) {
                double file = choice.spec().toFile(typed.getAsDouble(), textUnits);
                value.setText(VariantChoices.number(choice.spec(), file, units, context.view().locale()));
            }
            textUnits = units;
            unit.setText(choice.spec().unitSymbol(units));
        } else {
            showChoice();
        }
        refreshList();
    }

    /** Lists the change chosen (in place of an earlier change of the same quantity) once the core accepts it. */
    void addChange() {
        VariantChoices.Choice choice = (VariantChoices.Choice) what.getSelectedItem();
        if (choice == null) {
            return;
        }
        VehicleDocument car;
        VariantChange change;
        try {
            car = context.currentCar();
            change = choice.isHole() ? VariantChange.hole(choice, hole.getSelectedIndex() + 1)
                    : VariantChange.number(choice, value.getText(), textUnits, context.view().locale());
        } catch (IllegalArgumentException | IllegalStateException refused) {
            say.accept(refused.getMessage());
            return;
        }
        if (change.changesNothing(car.tree())) {
            say.accept(choice.title() + " is already " + change.newValue(context.view().units(),
                    context.view().locale()) + " on the open car: choose another value.");
            return;
        }
        List<VariantChange> trial = new ArrayList<>(pending);
        trial.removeIf(earlier -> earlier.choice().path().equals(choice.path()));
        trial.add(change);
        try {
            VehicleLoader.withEdits(car, trial.stream().map(VariantChange::edit).toList());
        } catch (VehicleFileException refused) {
            say.accept(change.refusal(refused.problems(), choices, context.view().units(), context.view().locale()));
            return;
        }
        pending.clear();
        pending.addAll(trial);
        refreshList();
    }

    private void removeChosen() {
        int row = list.getSelectedIndex();
        if (row >= 0 && row < pending.size()) {
            pending.remove(row);
            refreshList();
        }
    }

    private void refreshList() {
        JsonNode tree = context.document().lastValid().tree();
        shown.clear();
        pending.forEach(change -> shown.addElement(change.words(tree, context.view().units(),
                context.view().locale())));
    }
}
