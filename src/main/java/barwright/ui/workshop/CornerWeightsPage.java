package barwright.ui.workshop;

import barwright.io.VehicleDocument;
import barwright.io.VehicleEdits;
import barwright.measure.CornerWeighing;
import barwright.measure.CornerWeights;
import barwright.measure.MeasurementException;
import barwright.model.AxlePosition;
import barwright.model.CornerMasses;
import barwright.report.measure.MeasureText;
import barwright.sizing.preload.GainingDiagonal;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.ScrollingPage;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.SwingConstants;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.GridLayout;

/**
 * Corner weights (model.md 12.4): four scale readings laid out as the scales sit under the car (front at the
 * top), in kg or lb as the view's units say; the front and left shares, the cross weight and, through the
 * link-preload model, the link change for a target cross weight; "Use these in the car" puts the four
 * readings into the open car as one undoable edit.
 */
public final class CornerWeightsPage extends JPanel {
    private static final int DECIMALS = 1;
    private final OpenDocument document;
    private final ViewSettings view;
    private final ReadingField leftFront;
    private final ReadingField rightFront;
    private final ReadingField leftRear;
    private final ReadingField rightRear;
    private final ReadingField target;
    private final JComboBox<String> axle = new JComboBox<>(new String[] {"front", "rear"});
    private final JComboBox<String> diagonal = new JComboBox<>(new String[] {
            "left front and right rear", "right front and left rear"});
    private final ResultText result = new ResultText("corners.result");
    private final JButton use = new JButton("Use these readings in the car");
    private final JLabel[] units = new JLabel[4];
    private CornerWeights current;

    public CornerWeightsPage(OpenDocument document, ViewSettings view) {
        super(new BorderLayout());
        setName("corners.page");
        this.document = document;
        this.view = view;
        leftFront = mass("corners.leftFront", "the left front scale");
        rightFront = mass("corners.rightFront", "the right front scale");
        leftRear = mass("corners.leftRear", "the left rear scale");
        rightRear = mass("corners.rightRear", "the right rear scale");
        target = new ReadingField("corners.target", "the cross weight wanted (per cent)", () -> null, this::workOut);
        target.setToolTipText("Optional: the cross weight you want, in per cent (left front + right rear over all "
                + "four), e.g. 50");

        JPanel scales = new JPanel(new GridLayout(2, 2, 24, 12));
        scales.add(scale("Left front", leftFront, 0));
        scales.add(scale("Right front", rightFront, 1));
        scales.add(scale("Left rear", leftRear, 2));
        scales.add(scale("Right rear", rightRear, 3));
        JPanel car = new JPanel(new BorderLayout(4, 4));
        JLabel front = new JLabel("\u2191 front of the car", SwingConstants.CENTER);
        car.add(front, BorderLayout.NORTH);
        car.add(scales, BorderLayout.CENTER);
        car.setBorder(BorderFactory.createTitledBorder("The four scales"));
        car.setToolTipText("The four scales, as they sit under the car");

        // each question over its answer: side by side the longest passed 570 px at 28 points
        JPanel options = new JPanel(new GridLayout(6, 1, 0, 2));
        options.add(new JLabel("Cross weight wanted (%, optional)"));
        options.add(leftAligned(target));
        options.add(new JLabel("Reached by the link of the bar at the"));
        axle.setName("corners.axle");
        options.add(leftAligned(axle));
        options.add(new JLabel("A longer link there loads"));
        diagonal.setName("corners.diagonal");
        diagonal.setToolTipText("Which diagonal gains load when that link is made longer depends on the side and on "
                + "how the bar end sits: check it on the car");
        options.add(leftAligned(diagonal));
        axle.addActionListener(event -> workOut());
        diagonal.addActionListener(event -> workOut());

        JPanel top = new JPanel(new BorderLayout(8, 8));
        top.add(car, BorderLayout.CENTER);
        top.add(options, BorderLayout.SOUTH);
        use.setName("corners.use");
        use.setEnabled(false);
        use.setToolTipText("Put the four readings into the car as its corner masses (one step; Edit > Undo takes "
                + "it back); the mass and front share then follow from them");
        use.addActionListener(event -> useInCar());
        setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        add(ScrollingPage.of(ReadingsAndAnswer.of(top, use, result)), BorderLayout.CENTER);
        view.addListener(this::unitsChanged);
        document.addListener(event -> workOut());
        unitsChanged();
    }

    private ReadingField mass(String name, String what) {
        return new ReadingField(name, what, () -> Quantity.MASS.unit(view.units()), this::workOut);
    }

    private static JPanel leftAligned(java.awt.Component field) {
        JPanel row = new JPanel(new FlowLayout(FlowLayout.LEADING, 0, 0));
        row.add(field);
        return row;
    }

    private JPanel scale(String title, ReadingField field, int index) {
        JPanel panel = new JPanel(new FlowLayout(FlowLayout.CENTER, 6, 4));
        panel.setBorder(BorderFactory.createTitledBorder(title));
        field.setColumns(6); // a reading such as 1234.5: two scales side by side fit 570 px at 28 points
        panel.add(field);
        units[index] = new JLabel();
        panel.add(units[index]);
        return panel;
    }

    private void unitsChanged() {
        for (ReadingField field : new ReadingField[] {leftFront, rightFront, leftRear, rightRear}) {
            field.unitsChanged(DECIMALS);
        }
        for (JLabel unit : units) {
            unit.setText(Quantity.MASS.unit(view.units()).symbol());
        }
        workOut();
    }

    /** Types the four readings in (a test, or a paste): kg in SI units. */
    public void setReadings(double leftFrontKg, double rightFrontKg, double leftRearKg, double rightRearKg) {
        leftFront.showSi(leftFrontKg, DECIMALS);
        rightFront.showSi(rightFrontKg, DECIMALS);
        leftRear.showSi(leftRearKg, DECIMALS);
        rightRear.showSi(rightRearKg, DECIMALS);
    }

    private void workOut() {
        current = null;
        use.setEnabled(false);
        VehicleDocument car = document.lastValid();
        try {
            double lf = leftFront.si();
            double rf = rightFront.si();
            double lr = leftRear.si();
            double rr = rightRear.si();
            Double wanted = target.isBlank() ? null : target.plain() / 100;
            if (car == null) {
                current = CornerWeighing.of(lf, rf, lr, rr);
            } else {
                AxlePosition position = "rear".equals(axle.getSelectedItem()) ? AxlePosition.REAR : AxlePosition.FRONT;
                GainingDiagonal gaining = diagonal.getSelectedIndex() == 1 ? GainingDiagonal.RIGHT_FRONT_LEFT_REAR
                        : GainingDiagonal.LEFT_FRONT_RIGHT_REAR;
                current = CornerWeighing.of(lf, rf, lr, rr, car.vehicle(), wanted, position, gaining);
            }
            result.answer(MeasureText.corners(current, view.units()));
            use.setEnabled(car != null);
        } catch (ReadingField.ReadingException | MeasurementException refused) {
            result.why(refused.getMessage());
        }
    }

    /** Puts the four readings into the car: one edit, one undo step; a car that would be refused is left as it is. */
    public void useInCar() {
        if (current == null) {
            return;
        }
        CornerWeights readings = current;
        CheckedEdit.apply(document, tree -> VehicleEdits.putCornerMasses(tree, new CornerMasses(
                readings.leftFront(), readings.rightFront(), readings.leftRear(), readings.rightRear())), this).ifPresent(result::why);
    }

    /** @return the text shown (tests) */
    public String resultText() {
        return result.getText();
    }
}
