package barwright.ui.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.sizing.BarChoice;
import barwright.sizing.BarFigures;
import barwright.sizing.Candidate;
import barwright.sizing.SetupFigures;
import barwright.ui.panel.FigureFormat;
import barwright.units.Quantity;

import java.util.List;
import java.util.function.Function;

/**
 * The ranked candidates of a search as table rows, written in the units chosen when they are drawn. Where both
 * bars were sized each cell holds the front's value, then the rear's.
 */
final class CandidateTableModel extends TextTableModel {
    static final String[] COLUMNS = {"Rank", "Stock size", "Material", "Arm hole", "Front share", "Roll gradient",
        "Limit and balance", "Inside wheel lifts (front / rear)", "Bar mass", "Safety factor", "Miss (steps)"};
    static final String[] TOOLTIPS = {"Best first: closest to the target, then lightest",
        "The section as the catalogue names it", "The bar's material",
        "Arm hole counted from 1, the first arm length in the file; its length in brackets",
        "Front share of the lateral load transfer with this bar", "Body roll per g of lateral acceleration",
        "The grip limit and which axle reaches it first", "Lateral acceleration at which each inside wheel lifts",
        "Mass of each sized bar", "Static safety factor against yield at the check travel",
        "How far from the target: 1 step = 1 percentage point of front share, or 0.1 deg/g of roll gradient"};
    private final FigureFormat format;
    private List<Candidate> candidates = List.of();
    private Vehicle vehicle;

    CandidateTableModel(FigureFormat format) {
        super(COLUMNS);
        this.format = format;
    }

    /** @param searched the car the candidates were found for (their arm lengths are its bars') */
    void show(List<Candidate> shown, Vehicle searched) {
        candidates = List.copyOf(shown);
        vehicle = searched;
        fireTableDataChanged();
    }

    /** Draws every row again in the units now chosen. */
    void unitsChanged() {
        fireTableRowsUpdated(0, Math.max(0, candidates.size() - 1));
    }

    Candidate candidate(int row) {
        return candidates.get(row);
    }

    @Override
    public int getRowCount() {
        return candidates.size();
    }

    @Override
    public Object getValueAt(int row, int column) {
        Candidate candidate = candidates.get(row);
        SetupFigures figures = candidate.figures();
        return switch (column) {
            case 0 -> Integer.toString(row + 1);
            case 1 -> perBar(candidate, choice -> choice.size().label(), true);
            case 2 -> perBar(candidate, choice -> choice.material().name(), false);
            case 3 -> perBar(candidate, choice -> hole(candidate, choice), false);
            case 4 -> format.text(figures.frontLoadTransferShare(), Quantity.SHARE);
            case 5 -> format.text(figures.rollGradient(), Quantity.ROLL_GRADIENT);
            case 6 -> format.text(figures.limit(), Quantity.ACCELERATION) + ", " + figures.balance().key();
            case 7 -> lift(figures, AxlePosition.FRONT) + " / " + lift(figures, AxlePosition.REAR);
            case 8 -> perBar(candidate, choice -> format.text(bar(candidate, choice).mass(), Quantity.MASS), false);
            case 9 -> perBar(candidate, choice -> format.factor(bar(candidate, choice).safetyFactor()), false);
            default -> String.format(format.view().locale(), "%.2f", candidate.miss());
        };
    }

    private String lift(SetupFigures figures, AxlePosition axle) {
        String lift = format.lift(figures.insideLift(axle));
        return figures.liftsBeforeLimit(axle) ? lift + " (before the limit)" : lift;
    }

    private static BarFigures bar(Candidate candidate, BarChoice choice) {
        return candidate.figures().bar(choice.axle());
    }

    private String hole(Candidate candidate, BarChoice choice) {
        AntiRollBar bar = vehicle.axle(choice.axle()).bar().withSelectedArm(choice.selectedArm());
        String number = Integer.toString(choice.selectedArm() + 1);
        return bar.isShaped() ? number : number + " (" + format.text(bar.selectedArmLength(), Quantity.LENGTH) + ")";
    }

    /** @return the value for each sized bar; "front: …, rear: …" where there are two */
    private static String perBar(Candidate candidate, Function<BarChoice, String> value, boolean named) {
        if (candidate.bars().size() == 1) {
            return value.apply(candidate.bars().get(0));
        }
        StringBuilder text = new StringBuilder();
        for (BarChoice choice : candidate.bars()) {
            if (!text.isEmpty()) {
                text.append(" / ");
            }
            text.append(named ? choice.axle().key() + " " : "").append(value.apply(choice));
        }
        return text.toString();
    }
}
