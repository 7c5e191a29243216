package barwright.ui.panel;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.GripLostToTransfer;
import barwright.physics.AxleResult;
import barwright.physics.TurnResult;
import barwright.physics.bar.BarModel;
import barwright.physics.bar.BarResult;
import barwright.report.RateCalibrationOutput;
import barwright.report.work.KeyFigure;
import barwright.report.work.KeyFigure.Kind;
import barwright.ui.task.ResultsModel;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSeparator;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;

import static barwright.ui.panel.Grid.at;
import java.awt.Insets;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * The key figures, always in view: roll stiffness per axle, the balance figures, each turn's limit and lifts,
 * the bars. Each figure opens its working. Greyed and slanted while the results are out of date.
 */
public final class FiguresPanel extends JPanel {
    private final ResultsModel results;
    private final FigureFormat format;
    private final Consumer<KeyFigure> showWork;
    private final Map<FigureButton, Function<AnalysisResult, String>> figures = new LinkedHashMap<>();
    private int row;
    private JLabel lastLabel;

    public FiguresPanel(ResultsModel results, FigureFormat format, Consumer<KeyFigure> showWork) {
        super(new GridBagLayout());
        this.results = results;
        this.format = format;
        this.showWork = showWork;
        setName("figures");
        setBorder(BorderFactory.createEmptyBorder(6, 8, 6, 8));
        build();
        results.addListener(this::refresh);
        format.view().addListener(this::refresh);
    }

    private void build() {
        heading("Roll stiffness", "Front", "Rear");
        for (var part : new Object[][]{
                {"Springs", Kind.SPRING_ROLL_STIFFNESS, "springs"},
                {"Bar", Kind.BAR_ROLL_STIFFNESS, "bar"},
                {"Tyres", Kind.TYRE_ROLL_STIFFNESS, "tyres"},
                {"Axle, tyres in series", Kind.AXLE_ROLL_STIFFNESS, "axle"}}) {
            Kind kind = (Kind) part[1];
            pair((String) part[0], "figure.rollStiffness." + part[2], axle -> KeyFigure.of(kind, axle),
                    (result, axle) -> stiffness(result.axle(axle), kind));
            if (kind == Kind.AXLE_ROLL_STIFFNESS) {
                explain("The springs and the bar work side by side; the tyres work in series with both, so the "
                        + "whole axle is softer than its stiffest part and can be below the bar alone.");
            }
        }
        heading("Balance", null, null);
        single("Roll gradient, tyres included", "figure.rollGradient", KeyFigure.of(Kind.ROLL_GRADIENT),
                result -> format.text(result.rollGradient(), Quantity.ROLL_GRADIENT));
        explain("Body roll per g with the tyres' own deflection counted: what the body does on the road.");
        single("Roll gradient, springs and bars", "figure.suspensionRollGradient", KeyFigure.of(Kind.ROLL_GRADIENT),
                result -> format.text(result.suspensionRollGradient(), Quantity.ROLL_GRADIENT));
        explain("Body roll per g from the springs and bars alone, rigid tyres: the figure most other sources "
                + "quote. Its working is the same formula with the tyres left out.");
        single("Front share of load transfer", "figure.frontShare", KeyFigure.of(Kind.FRONT_LOAD_TRANSFER_SHARE),
                result -> format.text(result.frontLoadTransferShare(), Quantity.SHARE));
        single("Static front weight", "figure.staticFront", KeyFigure.of(Kind.STATIC_FRONT_WEIGHT),
                result -> format.text(result.masses().frontMassFraction(), Quantity.SHARE));
        single("Understeer gradient, static", "figure.understeer", KeyFigure.of(Kind.UNDERSTEER_GRADIENT),
                result -> format.text(result.understeerGradient(), Quantity.ROLL_GRADIENT));
        explain("The static, linear value from the weight split and the tyres' cornering stiffness: a bar does "
                + "not move it. What a bar moves is the balance at the limit, below.");
        heading("In a steady turn", "Left turn", "Right turn");
        turns("Grip limit", "figure.limit", turn -> KeyFigure.of(Kind.LIMIT, turn),
                (result, turn) -> format.text(result.turn(turn).limit(), Quantity.ACCELERATION));
        turns("Balance at the limit", "figure.balance", turn -> KeyFigure.of(Kind.BALANCE, turn),
                (result, turn) -> result.turn(turn).balance().key());
        for (AxlePosition axle : AxlePosition.values()) {
            // why a bar moves the balance: the axle that transfers more load loses more of its grip (model.md 8.1)
            turns(Character.toUpperCase(axle.key().charAt(0)) + axle.key().substring(1)
                            + " grip lost to transfer", "figure.gripLost." + axle.key(), turn -> null,
                    (result, turn) -> format.text(GripLostToTransfer.atLimit(result, axle, turn), Quantity.SHARE));
        }
        for (AxlePosition axle : AxlePosition.values()) {
            turns("Inside " + axle.key() + " lifts at", "figure.lift." + axle.key(),
                    turn -> KeyFigure.of(Kind.INSIDE_LIFT, axle, turn),
                    (result, turn) -> lift(result.turn(turn), axle));
        }
        heading("Bars at the check travel", "Front", "Rear");
        pair("Link rate", "figure.bar.linkRate", axle -> KeyFigure.of(Kind.BAR_LINK_RATE, axle),
                (result, axle) -> bar(result, axle, b -> format.text(b.linkRate(), Quantity.LINEAR_RATE)));
        pair("Rate factor", "figure.bar.rateFactor", axle -> null,
                (result, axle) -> bar(result, axle, b -> RateCalibrationOutput.text(result.vehicle().axle(axle).bar())));
        pair("Mass", "figure.bar.mass", axle -> KeyFigure.of(Kind.BAR_MASS, axle),
                (result, axle) -> bar(result, axle, b -> format.text(b.mass(), Quantity.MASS)));
        pair("Largest stress", "figure.bar.stress", axle -> KeyFigure.of(Kind.BAR_SAFETY_FACTOR, axle),
                (result, axle) -> bar(result, axle, b -> format.text(b.maxVonMisesStress(), Quantity.STRESS)));
        pair("Safety factor", "figure.bar.safetyFactor", axle -> KeyFigure.of(Kind.BAR_SAFETY_FACTOR, axle),
                (result, axle) -> bar(result, axle, b -> format.factor(b.safetyFactor())));
        pair("Each bushing carries", "figure.bar.bushing", axle -> KeyFigure.of(Kind.BAR_BUSHING_LOAD, axle),
                (result, axle) -> bar(result, axle, b -> b.bushingLoads().isEmpty() ? "-"
                        : format.text(b.bushingLoads().stream().mapToDouble(Double::doubleValue).max().orElse(0),
                        Quantity.FORCE)));
        pair("Worked out by", "figure.bar.model", axle -> null,
                (result, axle) -> bar(result, axle, b -> b.model() == BarModel.BEAM ? "beam frame" : "closed form"));
        GridBagConstraints filler = at(0, row++, 3);
        filler.weighty = 1;
        JPanel rest = new JPanel();
        rest.setOpaque(false);
        add(rest, filler);
    }

    private String stiffness(AxleResult axle, Kind kind) {
        var stiffness = axle.stiffness();
        return switch (kind) {
            case SPRING_ROLL_STIFFNESS -> format.text(stiffness.springRollStiffness(), Quantity.ROLL_STIFFNESS);
            case BAR_ROLL_STIFFNESS -> axle.bar() == null ? "no bar"
                    : format.text(stiffness.barRollStiffness(), Quantity.ROLL_STIFFNESS);
            case TYRE_ROLL_STIFFNESS -> format.text(stiffness.tyreRollStiffness(), Quantity.ROLL_STIFFNESS);
            default -> format.text(stiffness.rollStiffness(), Quantity.ROLL_STIFFNESS);
        };
    }

    private String lift(TurnResult turn, AxlePosition axle) {
        return format.lift(axle == AxlePosition.FRONT ? turn.frontInsideLift() : turn.rearInsideLift());
    }

    private static String bar(AnalysisResult result, AxlePosition axle, Function<BarResult, String> text) {
        BarResult bar = result.axle(axle).bar();
        return bar == null ? "no bar" : text.apply(bar);
    }

    private void heading(String title, String first, String second) {
        JLabel label = new JLabel(title);
        label.putClientProperty("FlatLaf.styleClass", "h4");
        GridBagConstraints at = at(0, row, 1);
        at.insets = new Insets(row == 0 ? 0 : 10, 0, 2, 0);
        add(label, at);
        for (int column = 1; column <= 2; column++) {
            String text = column == 1 ? first : second;
            if (text != null) {
                JLabel header = new JLabel(text, JLabel.RIGHT);
                header.setForeground(Palette.muted());
                GridBagConstraints headerAt = at(column, row, 1);
                headerAt.insets = at.insets;
                add(header, headerAt);
            }
        }
        row++;
        GridBagConstraints line = at(0, row++, 3);
        add(new JSeparator(), line);
    }

    private void single(String label, String name, KeyFigure figure, Function<AnalysisResult, String> text) {
        label(label);
        FigureButton button = new FigureButton(name, figure, showWork);
        figures.put(button, text);
        add(button, at(1, row++, 2));
    }

    private void pair(String label, String name, Function<AxlePosition, KeyFigure> figure,
                      java.util.function.BiFunction<AnalysisResult, AxlePosition, String> text) {
        label(label);
        int column = 1;
        for (AxlePosition axle : AxlePosition.values()) {
            FigureButton button = new FigureButton(name + "." + axle.key(), figure.apply(axle), this::openIfPresent);
            figures.put(button, result -> text.apply(result, axle));
            add(button, at(column++, row, 1));
        }
        row++;
    }

    private void turns(String label, String name, Function<TurnDirection, KeyFigure> figure,
                       java.util.function.BiFunction<AnalysisResult, TurnDirection, String> text) {
        label(label);
        int column = 1;
        for (TurnDirection turn : TurnDirection.values()) {
            FigureButton button = new FigureButton(name + "." + turn.word(), figure.apply(turn), showWork);
            figures.put(button, result -> text.apply(result, turn));
            add(button, at(column++, row, 1));
        }
        row++;
    }

    /** Bar figures of an axle with no bar have nothing to show. */
    private void openIfPresent(KeyFigure figure) {
        var shown = results.shown();
        if (shown != null && shown.result() != null && (figure.kind() == Kind.BAR_ROLL_STIFFNESS
                || !figure.kind().name().startsWith("BAR_") || shown.result().axle(figure.axle()).bar() != null)) {
            showWork.accept(figure);
        }
    }

    /** Puts a plain-words explanation on the label of the row just added. */
    private void explain(String text) {
        lastLabel.setToolTipText(text);
    }

    private void label(String text) {
        JLabel label = new JLabel(text);
        lastLabel = label;
        GridBagConstraints at = at(0, row, 1);
        at.weightx = 1;
        add(label, at);
    }

    private void refresh() {
        var shown = results.shown();
        if (shown == null || shown.result() == null) {
            return;
        }
        boolean stale = results.isStale();
        figures.forEach((button, text) -> button.show(text.apply(shown.result()), stale));
    }

    /** @return the figure's text as shown, for tests and screen readers */
    public String figureText(String name) {
        return figures.keySet().stream().filter(b -> name.equals(b.getName())).findFirst()
                .map(FigureButton::getText).orElseThrow(() -> new IllegalArgumentException("no figure " + name));
    }
}
