package barwright.ui.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.Vehicle;
import barwright.sizing.BarSearch;
import barwright.sizing.Constraints;
import barwright.sizing.ExactSize;
import barwright.sizing.ExactSolution;
import barwright.sizing.ReachableShare;
import barwright.sizing.SetupEvaluator;
import barwright.sizing.ShareReach;
import barwright.sizing.SizeChoices;
import barwright.sizing.SizingRequest;
import barwright.sizing.Targets;
import barwright.sizing.catalogue.CatalogueFileException;
import barwright.sizing.catalogue.Catalogues;
import barwright.sizing.catalogue.StockSize;
import barwright.solver.Progress;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * Turns the search form's settings into the core's search, and runs it (off the event thread): the ranked
 * stock sizes, and for one bar the exact solid diameter and, where a tube diameter is given, the exact wall.
 * No Swing: it is tested without a window.
 */
final class SearchPlan {
    private SearchPlan() {
    }

    /**
     * @throws IllegalArgumentException with a message for people where the settings cannot make a search
     */
    static SizingRequest request(Vehicle vehicle, SearchSettings settings) {
        Map<AxlePosition, SizeChoices> choices = choices(vehicle, settings);
        return new SizingRequest(settings.axles(), targets(settings), constraints(settings), choices,
                settings.count(), SizingRequest.DEFAULT_TIE_BAND);
    }

    /**
     * The front shares the bars of a search with these settings can reach on the car (whatever it aims at), and
     * the car's static front weight; off the event thread.
     *
     * @throws IllegalArgumentException with a message for people where the settings cannot make a search
     */
    static Reach reach(Vehicle vehicle, SearchSettings settings) {
        SetupEvaluator evaluator = new SetupEvaluator(vehicle);
        return new Reach(settings.axles(), evaluator.masses().frontMassFraction(), ReachableShare.of(evaluator,
                settings.axles(), choices(vehicle, settings), constraints(settings)).orElse(null));
    }

    /**
     * @param axles       the sized axles
     * @param staticFront the car's static front weight fraction
     * @param reach       the front shares reachable, or null where none is (no bar passes the limits)
     */
    record Reach(List<AxlePosition> axles, double staticFront, ShareReach reach) {
    }

    private static Map<AxlePosition, SizeChoices> choices(Vehicle vehicle, SearchSettings settings) {
        Map<AxlePosition, SizeChoices> choices = new EnumMap<>(AxlePosition.class);
        List<StockSize> sizes = sizes(settings.catalogues());
        for (AxlePosition axle : settings.axles()) {
            AntiRollBar bar = vehicle.axle(axle).bar();
            if (bar == null) {
                throw new IllegalArgumentException("The " + axle.key() + " axle has no bar: give it one in the main "
                        + "window first (its torsion length, arms and link); the search then picks its material, "
                        + "section and arm hole.");
            }
            choices.put(axle, new SizeChoices(materials(settings.ownMaterial(), settings.materials(), bar),
                    sizes, List.of()));
        }
        refuseTooManyPairs(vehicle, choices);
        return choices;
    }

    /**
     * Refuses, before any work starts, a search of both bars whose pairs exceed what one search tries, saying in
     * words what to narrow.
     *
     * @throws IllegalArgumentException where front bars times rear bars exceed {@link BarSearch#MAX_PAIRS}
     */
    private static void refuseTooManyPairs(Vehicle vehicle, Map<AxlePosition, SizeChoices> choices) {
        if (choices.size() < 2) {
            return;
        }
        long front = barsTried(vehicle, AxlePosition.FRONT, choices.get(AxlePosition.FRONT));
        long rear = barsTried(vehicle, AxlePosition.REAR, choices.get(AxlePosition.REAR));
        if (front * rear <= BarSearch.MAX_PAIRS) {
            return;
        }
        SizeChoices frontChoices = choices.get(AxlePosition.FRONT);
        throw new IllegalArgumentException(String.format(Locale.ROOT, "Too many pairs to try: %,d front bars "
                        + "against %,d rear bars make %,d pairs, and one search tries at most %,d. Narrow it: tick "
                        + "fewer materials (%d ticked) or fewer catalogues (%d stock sizes), or size one bar at a "
                        + "time (choose \"front bar\", then \"rear bar\", under Which bar).", front, rear,
                front * rear, BarSearch.MAX_PAIRS, frontChoices.materials().size(), frontChoices.sizes().size()));
    }

    /** @return materials x sizes x holes: the bars one axle's search tries */
    private static long barsTried(Vehicle vehicle, AxlePosition axle, SizeChoices choices) {
        return (long) choices.materials().size() * choices.sizes().size()
                * choices.holesOf(vehicle.axle(axle).bar().holeCount()).size();
    }

    /** The whole search, with progress and cancel; for one bar also the exact sizes. */
    static SearchOutcome run(Vehicle vehicle, SearchSettings settings, Progress progress) {
        SizingRequest request = request(vehicle, settings);
        var result = BarSearch.run(vehicle, request, progress);
        ExactSolution solid = null;
        ExactSolution wall = null;
        if (request.axles().size() == 1) {
            AxlePosition axle = request.axles().get(0);
            SetupEvaluator evaluator = new SetupEvaluator(vehicle);
            Material material = request.choices().get(axle).materials().get(0);
            int hole = vehicle.axle(axle).bar().selectedArm();
            solid = ExactSize.solidDiameter(evaluator, axle, material, hole, request.targets());
            if (settings.tubeDiameter() != null) {
                wall = ExactSize.tubeWall(evaluator, axle, material, hole, settings.tubeDiameter(), request.targets());
            }
        }
        return new SearchOutcome(vehicle, settings, request, result, solid, wall);
    }

    static Targets targets(SearchSettings settings) {
        Double share = settings.share() == SearchSettings.ShareAim.SHARE ? settings.shareValue() : null;
        Double offset = settings.share() == SearchSettings.ShareAim.OFFSET_FROM_STATIC ? settings.shareValue() : null;
        if (share == null && offset == null && settings.rollGradient() == null) {
            throw new IllegalArgumentException("Give a target: tick the front share of load transfer, the roll "
                    + "gradient, or both.");
        }
        return new Targets(share, offset, settings.rollGradient());
    }

    static Constraints constraints(SearchSettings settings) {
        Set<AxlePosition> staysDown = EnumSet.noneOf(AxlePosition.class);
        if (settings.frontStaysDown()) {
            staysDown.add(AxlePosition.FRONT);
        }
        if (settings.rearStaysDown()) {
            staysDown.add(AxlePosition.REAR);
        }
        return new Constraints(settings.minSafetyFactor(), staysDown, settings.maxBarMass(),
                settings.maxOuterDiameter());
    }

    /**
     * @return the bar's own material first where it is asked for, then the others, each once
     * @throws IllegalArgumentException where none is asked for
     */
    static List<Material> materials(boolean own, List<Material> others, AntiRollBar bar) {
        Set<Material> chosen = new LinkedHashSet<>();
        if (own) {
            chosen.add(bar.material());
        }
        chosen.addAll(others);
        if (chosen.isEmpty()) {
            throw new IllegalArgumentException("Materials: tick at least one material to try.");
        }
        return new ArrayList<>(chosen);
    }

    /** @return every size of the catalogues, in order */
    static List<StockSize> sizes(List<String> catalogues) {
        if (catalogues.isEmpty()) {
            throw new IllegalArgumentException("Stock sizes: tick at least one catalogue, or give your own file.");
        }
        List<StockSize> sizes = new ArrayList<>();
        for (String name : catalogues) {
            try {
                sizes.addAll(Catalogues.find(name).sizes());
            } catch (CatalogueFileException refused) {
                throw new IllegalArgumentException("The catalogue " + name + " is refused:\n" + refused.getMessage());
            }
        }
        return sizes;
    }
}
