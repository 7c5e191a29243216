package barwright.ui.workshop;

import barwright.io.VehicleDocument;
import barwright.io.VehicleEdits;
import barwright.measure.CentreOfMassHeight;
import barwright.measure.MeasurementException;
import barwright.measure.TiltMethod;
import barwright.measure.TiltTest;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.report.measure.MeasureText;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.ScrollingPage;
import barwright.units.Figures;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.ArrayList;
import java.util.List;

/**
 * The centre-of-mass height by raising one axle (model.md 12.3): the car's mass, level front-axle mass and
 * wheelbase come from the open car; the person types the raise, the front axle's reading with the car tilted
 * and, optionally, the wheel centre height and the resolutions. The height, its uncertainty and the method's
 * cautions are shown; "Use this height in the car" is one undoable edit.
 */
public final class CentreOfMassPage extends JPanel {
    private final OpenDocument document;
    private final ViewSettings view;
    private final JComboBox<String> raised = new JComboBox<>(new String[] {"rear", "front"});
    private final ReadingField raise;
    private final ReadingField tiltedFront;
    private final ReadingField wheelCentre;
    private final ReadingField scaleResolution;
    private final ReadingField raiseResolution;
    private final List<Runnable> relabel = new ArrayList<>();
    private final Words fromCar = new Words("cg.fromCar", " ");
    private final ResultText result = new ResultText("cg.result");
    private final JButton use = new JButton("Use this height in the car");
    private CentreOfMassHeight current;

    public CentreOfMassPage(OpenDocument document, ViewSettings view) {
        super(new BorderLayout());
        setName("cg.page");
        this.document = document;
        this.view = view;
        raise = length("cg.raise", "how far the axle was raised");
        tiltedFront = mass("cg.tiltedFront", "the front axle's reading with the car tilted");
        wheelCentre = length("cg.wheelCentre", "the wheel centre height");
        scaleResolution = mass("cg.scaleResolution", "the scales' resolution");
        raiseResolution = length("cg.raiseResolution", "the resolution of the raise reading");
        scaleResolution.showSi(0.5, 1);
        raiseResolution.showSi(1e-3, 1);
        wheelCentre.setToolTipText("Blank: the unsprung centre-of-mass height of the car file, about the wheel centre");

        JPanel form = new JPanel(new GridBagLayout());
        raised.setName("cg.raisedAxle");
        raised.addActionListener(event -> workOut());
        row(form, 0, "Axle raised", raised, null);
        row(form, 1, "Raised by (at the wheel centres)", raise, Quantity.LENGTH);
        row(form, 2, "Front axle reading, car tilted", tiltedFront, Quantity.MASS);
        row(form, 3, "Wheel centre height (optional)", wheelCentre, Quantity.LENGTH);
        row(form, 4, "Scale resolution", scaleResolution, Quantity.MASS);
        row(form, 5, "Tape resolution", raiseResolution, Quantity.LENGTH);
        JPanel top = new JPanel(new BorderLayout(4, 4));
        Words how = new Words("cg.how", "Weigh level, raise one axle, weigh the front again.");
        how.setFont(how.getFont().deriveFont(java.awt.Font.BOLD));
        top.add(how, BorderLayout.NORTH);
        top.add(form, BorderLayout.WEST);
        top.add(fromCar, BorderLayout.SOUTH);

        use.setName("cg.use");
        use.setEnabled(false);
        use.setToolTipText("Put the measured height into the car (one step; Edit > Undo takes it back)");
        use.addActionListener(event -> useInCar());
        setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        add(ScrollingPage.of(ReadingsAndAnswer.of(top, use, result)), BorderLayout.CENTER);
        view.addListener(this::unitsChanged);
        document.addListener(event -> workOut());
        unitsChanged();
    }

    private ReadingField length(String name, String what) {
        return new ReadingField(name, what, () -> Quantity.LENGTH.unit(view.units()), this::workOut);
    }

    private ReadingField mass(String name, String what) {
        return new ReadingField(name, what, () -> Quantity.MASS.unit(view.units()), this::workOut);
    }

    /** A reading's name over its field and unit: side by side the longest name and its field passed 570 px. */
    private void row(JPanel form, int y, String label, Component field, Quantity quantity) {
        GridBagConstraints at = new GridBagConstraints();
        at.gridx = 0;
        at.gridy = 2 * y;
        at.gridwidth = 2;
        at.insets = new Insets(6, 4, 0, 4);
        at.anchor = GridBagConstraints.LINE_START;
        JLabel name = new JLabel(label);
        name.setLabelFor(field);
        form.add(name, at);
        at.gridy = 2 * y + 1;
        at.gridwidth = 1;
        at.insets = new Insets(2, 4, 2, 4);
        at.fill = GridBagConstraints.HORIZONTAL;
        form.add(field, at);
        if (quantity != null) {
            JLabel unit = new JLabel();
            relabel.add(() -> unit.setText(quantity.unit(view.units()).symbol()));
            at.gridx = 1;
            at.fill = GridBagConstraints.NONE;
            form.add(unit, at);
        }
    }

    private void unitsChanged() {
        raise.unitsChanged(1);
        tiltedFront.unitsChanged(1);
        wheelCentre.unitsChanged(1);
        scaleResolution.unitsChanged(2);
        raiseResolution.unitsChanged(2);
        relabel.forEach(Runnable::run);
        workOut();
    }

    /** Types the readings in (a test): SI units; a null wheel centre leaves the field blank. */
    public void setReadings(AxlePosition raisedAxle, double raiseMetres, double tiltedFrontKg, Double wheelCentreMetres) {
        raised.setSelectedItem(raisedAxle.key());
        raise.showSi(raiseMetres, 1);
        tiltedFront.showSi(tiltedFrontKg, 1);
        if (wheelCentreMetres == null) {
            wheelCentre.setText("");
        } else {
            wheelCentre.showSi(wheelCentreMetres, 1);
        }
    }

    private void workOut() {
        current = null;
        use.setEnabled(false);
        VehicleDocument car = document.lastValid();
        if (car == null) {
            result.why("The open car has a refused value: correct it first (the car's mass, front share and "
                    + "wheelbase are taken from it).");
            return;
        }
        Vehicle vehicle = car.vehicle();
        double defaultCentre = TiltTest.assumedWheelCentreHeight(vehicle);
        fromCar.setText(String.format("Level readings from the car file: mass %s, front axle %s, wheelbase %s.",
                Figures.format(vehicle.mass(), Quantity.MASS, view.units(), 1, view.locale()),
                Figures.format(vehicle.mass() * vehicle.frontMassFraction(), Quantity.MASS, view.units(), 1,
                        view.locale()),
                Figures.format(vehicle.wheelbase(), Quantity.LENGTH, view.units(), 0, view.locale())));
        try {
            TiltTest test = TiltTest.on(vehicle,
                    "front".equals(raised.getSelectedItem()) ? AxlePosition.FRONT : AxlePosition.REAR, raise.si(),
                    tiltedFront.si(), wheelCentre.isBlank() ? defaultCentre : wheelCentre.si(),
                    scaleResolution.si(), raiseResolution.si());
            current = TiltMethod.height(test);
            String text = MeasureText.centreOfMass(current, view.units());
            if (wheelCentre.isBlank()) {
                text += "\nThe wheel centre height was taken as the car file's unsprung centre-of-mass height ("
                        + Figures.format(defaultCentre, Quantity.LENGTH, view.units(), 0, view.locale())
                        + "); type it to set it.\n";
            }
            result.answer(text);
            use.setEnabled(true);
        } catch (ReadingField.ReadingException | MeasurementException refused) {
            result.why(refused.getMessage());
        }
    }

    /** Puts the height into the car: one edit, one undo step; a height the file would refuse is not put in. */
    public void useInCar() {
        if (current == null) {
            return;
        }
        double height = current.height();
        CheckedEdit.apply(document, tree -> VehicleEdits.putCentreOfMassHeight(tree, height), this)
                .ifPresent(result::why);
    }

    /** @return the text shown (tests) */
    public String resultText() {
        return result.getText();
    }
}
