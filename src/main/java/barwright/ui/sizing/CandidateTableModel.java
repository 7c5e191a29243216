package barwright.ui.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.sizing.BarChoice;
import barwright.sizing.BarFigures;
import barwright.sizing.Candidate;
import barwright.sizing.SetupFigures;
import barwright.sizing.TradeFlag;
import barwright.sizing.TradeLimits;
import barwright.report.sizing.TradeFlagText;
import barwright.ui.panel.FigureFormat;
import barwright.units.Quantity;

import java.util.List;
import java.util.function.Function;

/**
 * The ranked candidates of a search as table rows, written in the units chosen when they are drawn. Where both
 * bars were sized each cell holds the front's value, then the rear's.
 */
final class CandidateTableModel extends TextTableModel {
    /**
     * Short headers (the whole meaning is in each header's tooltip), the columns a choice turns on first: what
     * the bar is, what it gives, what it weighs, how hard it works and whether it is out of the ordinary; then
     * the rest, which a sideways scroll reaches.
     */
    static final String[] COLUMNS = {"#", "Size", "Mass", "Safety", "Flags", "Front share", "Hole", "Miss",
        "Material", "Roll gradient", "Limit", "Wheel lifts (F / R)"};
    static final String[] TOOLTIPS = {"Rank: best first, closest to the target, then lightest",
        "Stock size: the section as the catalogue names it", "Mass of each sized bar",
        "Static safety factor against yield at the check travel",
        "Where the bar lies outside what the trade usually fits a road or club car (common practice; the limits "
                + "are written under the table): heavy, thick or stressed. A caution, not a refusal",
        "Front share of the lateral load transfer with this bar",
        "Arm hole counted from 1, the first arm length in the file; its length in brackets",
        "Miss in steps, how far from the target: 1 step = 1 percentage point of front share, or 0.1 deg/g of "
                + "roll gradient",
        "The bar's material", "Body roll per g of lateral acceleration",
        "The grip limit and which axle reaches it first",
        "Lateral acceleration at which each inside wheel lifts, front / rear"};
    /** Column numbers, as {@link #COLUMNS} orders them. */
    static final int RANK = 0;
    static final int SIZE = 1;
    static final int MASS = 2;
    static final int SAFETY = 3;
    static final int FLAGS = 4;
    static final int FRONT_SHARE = 5;
    static final int HOLE = 6;
    static final int MISS = 7;
    static final int MATERIAL = 8;
    static final int ROLL_GRADIENT = 9;
    static final int LIMIT = 10;
    static final int LIFTS = 11;
    private final FigureFormat format;
    private List<Candidate> candidates = List.of();
    private List<List<TradeFlag>> flags = List.of();
    private Vehicle vehicle;

    CandidateTableModel(FigureFormat format) {
        super(COLUMNS);
        this.format = format;
    }

    /**
     * @param searched the car the candidates were found for (their arm lengths are its bars')
     * @param limits   what the trade usually fits, for the flags
     */
    void show(List<Candidate> shown, Vehicle searched, TradeLimits limits) {
        candidates = List.copyOf(shown);
        flags = candidates.stream().map(limits::flags).toList();
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

    /** @return the flags of the candidate in that row */
    List<TradeFlag> flags(int row) {
        return flags.get(row);
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
            case RANK -> Integer.toString(row + 1);
            case SIZE -> perBar(candidate, choice -> choice.size().label(), true);
            case MATERIAL -> perBar(candidate, choice -> choice.material().name(), false);
            case HOLE -> perBar(candidate, choice -> hole(candidate, choice), false);
            case FRONT_SHARE -> format.text(figures.frontLoadTransferShare(), Quantity.SHARE);
            case ROLL_GRADIENT -> format.text(figures.rollGradient(), Quantity.ROLL_GRADIENT);
            case LIMIT -> format.text(figures.limit(), Quantity.ACCELERATION) + ", " + figures.balance().key();
            case LIFTS -> lift(figures, AxlePosition.FRONT) + " / " + lift(figures, AxlePosition.REAR);
            case MASS -> perBar(candidate, choice -> format.text(bar(candidate, choice).mass(), Quantity.MASS), false);
            case SAFETY -> perBar(candidate, choice -> format.factor(bar(candidate, choice).safetyFactor()), false);
            case FLAGS -> TradeFlagText.words(candidate, flags.get(row));
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
