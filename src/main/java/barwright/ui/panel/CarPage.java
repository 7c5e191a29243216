package barwright.ui.panel;

import barwright.io.KeyPath;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.FieldCatalogue;
import barwright.ui.field.NumberText;
import barwright.ui.field.ViewSettings;
import com.fasterxml.jackson.databind.node.ObjectNode;

import javax.swing.BoxLayout;
import javax.swing.ButtonGroup;
import javax.swing.JPanel;
import javax.swing.JRadioButton;

/** The car as a whole: its name, what the scales say, what is measured on the body, the bar check travel. */
final class CarPage extends EditorPage {
    private static final String CORNERS = "vehicle.cornerMassesKg";

    CarPage(OpenDocument document, ViewSettings view) {
        super(document, view);
        rebuild();
    }

    @Override
    protected String shape() {
        return isObject(CORNERS) ? "corners" : "total";
    }

    @Override
    protected void build(Form form) {
        form.group("This file");
        form.field("Name", new TextValueField(document, KeyPath.of("name"),
                "A name for this car and set-up, shown in the title and in reports."), null, null);
        form.field("Notes", new TextValueField(document, KeyPath.of("notes"),
                "Anything worth keeping with the set-up: tyres, event, who measured what."), null, null);

        form.group("On the scales");
        boolean corners = isObject(CORNERS);
        JRadioButton total = new JRadioButton("Total and front share", !corners);
        JRadioButton four = new JRadioButton("Four wheel scales", corners);
        total.setName("weight.total");
        four.setName("weight.corners");
        total.setToolTipText(Tooltips.wrap("Give the car's mass and the share on the front wheels; left and "
                + "right are taken as equal.", 300));
        four.setToolTipText(Tooltips.wrap("Give each wheel's scale reading; a car heavier on one side then "
                + "lifts its wheels differently in left and right turns.", 300));
        ButtonGroup group = new ButtonGroup();
        group.add(total);
        group.add(four);
        JPanel choice = new JPanel();
        choice.setOpaque(false);
        choice.setLayout(new BoxLayout(choice, BoxLayout.Y_AXIS));
        choice.add(total);
        choice.add(four);
        form.field("Weighed as", choice, null, null);
        total.addActionListener(event -> useTotal());
        four.addActionListener(event -> useCorners());
        if (corners) {
            fields(form, CORNERS, FieldCatalogue.CORNERS);
        } else {
            fields(form, "vehicle", FieldCatalogue.WEIGHT);
        }

        form.group("Measured on the car");
        fields(form, "vehicle", FieldCatalogue.BODY);

        form.group("Bar stress check");
        fields(form, "analysis", FieldCatalogue.CHECK);
    }

    /** Four scale readings from the total and front share, split evenly left and right. */
    private void useCorners() {
        if (isObject(CORNERS)) {
            return;
        }
        double mass = document.lastValid().vehicle().mass();
        double front = document.lastValid().vehicle().frontMassFraction();
        document.editAll(tree -> {
            ObjectNode body = (ObjectNode) tree.get("vehicle");
            ObjectNode scales = body.putObject("cornerMassesKg");
            scales.put("leftFront", NumberText.forFile(mass * front / 2));
            scales.put("rightFront", NumberText.forFile(mass * front / 2));
            scales.put("leftRear", NumberText.forFile(mass * (1 - front) / 2));
            scales.put("rightRear", NumberText.forFile(mass * (1 - front) / 2));
            body.remove("massKg");
            body.remove("frontMassFraction");
        }, this);
    }

    /** The total and front share from the four readings. */
    private void useTotal() {
        if (!isObject(CORNERS)) {
            return;
        }
        double mass = document.lastValid().vehicle().mass();
        double front = document.lastValid().vehicle().frontMassFraction();
        document.editAll(tree -> {
            ObjectNode body = (ObjectNode) tree.get("vehicle");
            body.put("massKg", NumberText.forFile(mass));
            body.put("frontMassFraction", Math.round(front * 1e4) / 1e4);
            body.putNull("cornerMassesKg");
        }, this);
    }
}
