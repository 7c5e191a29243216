package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.Vehicle;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.RollBalance;
import barwright.sizing.catalogue.StockSize;
import barwright.solver.Progress;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.OptionalDouble;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.IntStream;

/**
 * The sizing search: every material x stock size x arm hole for one axle's bar (or every pair of such bars
 * for both axles), each tried on the car, those that break a constraint left out, the rest ranked closest
 * to the target first and then lightest. Candidates are tried in parallel on all cores (the common fork-join
 * pool and the calling thread); the ranking does not depend on the order they finish in.
 */
public final class BarSearch {
    /** Pairs of bars beyond this are refused: narrow the materials, sizes or holes (memory, and time). */
    public static final long MAX_PAIRS = 2_000_000;
    private static final int PROGRESS_EVERY = 64;

    private BarSearch() {
    }

    /**
     * @throws IllegalArgumentException where a sized axle has no bar to size (its geometry comes from the
     *                                  vehicle), or too many pairs are asked for
     * @throws java.util.concurrent.CancellationException where the progress asks to stop
     */
    public static SizingResult run(Vehicle vehicle, SizingRequest request, Progress progress) {
        SetupEvaluator evaluator = new SetupEvaluator(vehicle);
        double staticFront = evaluator.masses().frontMassFraction();
        ShareReach reach = ReachableShare.of(evaluator, request).orElse(null);
        Search search = new Search(evaluator, request, progress, staticFront, reach);
        return request.axles().size() == 1 ? search.single(request.axles().get(0)) : search.pairs();
    }

    /** @return every bar choice for one axle: materials, then sizes, then holes, in the order given */
    static List<BarChoice> enumerate(AxlePosition axle, AntiRollBar base, SizeChoices choices) {
        List<Integer> holes = choices.holesOf(base.holeCount());
        List<BarChoice> all = new ArrayList<>(choices.materials().size() * choices.sizes().size() * holes.size());
        for (Material material : choices.materials()) {
            for (StockSize size : choices.sizes()) {
                for (int hole : holes) {
                    all.add(new BarChoice(axle, material, size, hole));
                }
            }
        }
        return all;
    }

    /** @return the vehicle's bar on that axle, whose geometry the search keeps */
    static AntiRollBar requireBar(Vehicle vehicle, AxlePosition axle) {
        AntiRollBar bar = vehicle.axle(axle).bar();
        if (bar == null) {
            throw new IllegalArgumentException("the " + axle.key() + " axle has no bar: give its bar in the vehicle "
                    + "file first (torsion length, arm lengths, link motion ratio); the search picks the material, "
                    + "section and hole");
        }
        return bar;
    }

    /** One search's shared state; every field is read-only except the counters. */
    private static final class Search {
        private final SetupEvaluator evaluator;
        private final SizingRequest request;
        private final Constraints constraints;
        private final Progress progress;
        private final double staticFront;
        private final ShareReach reach;
        private final AtomicLong done = new AtomicLong();
        private long total;

        Search(SetupEvaluator evaluator, SizingRequest request, Progress progress, double staticFront,
               ShareReach reach) {
            this.reach = reach;
            this.evaluator = evaluator;
            this.request = request;
            this.constraints = request.constraints();
            this.progress = progress;
            this.staticFront = staticFront;
        }

        SizingResult single(AxlePosition axle) {
            List<BarChoice> choices = enumerate(axle, requireBar(evaluator.vehicle(), axle), request.choices().get(axle));
            AxleState other = evaluator.axle(axle.other());
            int count = choices.size();
            total = count;
            Candidate[] found = new Candidate[count];
            Rejection[] rejected = new Rejection[count];
            IntStream.range(0, count).parallel().forEach(i -> {
                progress.checkCancelled();
                BarChoice choice = choices.get(i);
                Screened screened = screen(choice);
                if (screened.rejection() != null) {
                    rejected[i] = screened.rejection();
                } else {
                    AxleState state = screened.state();
                    Outcome outcome = axle == AxlePosition.FRONT ? full(state, other) : full(other, state);
                    rejected[i] = outcome.rejection();
                    found[i] = outcome.figures() == null ? null : candidate(List.of(choice), outcome.figures());
                }
                tick();
            });
            List<Candidate> accepted = new ArrayList<>();
            for (int i = 0; i < count; i++) {
                if (found[i] != null && rejected[i] == null) {
                    accepted.add(found[i]);
                }
            }
            accepted.sort(ranking()); // stable: ties keep the enumeration order
            return new SizingResult(accepted.subList(0, Math.min(request.maxResults(), accepted.size())), count,
                    accepted.size(), count(rejected), targetShare(),
                    reach);
        }

        SizingResult pairs() {
            Vehicle vehicle = evaluator.vehicle();
            List<BarChoice> frontChoices = enumerate(AxlePosition.FRONT, requireBar(vehicle, AxlePosition.FRONT),
                    request.choices().get(AxlePosition.FRONT));
            List<BarChoice> rearChoices = enumerate(AxlePosition.REAR, requireBar(vehicle, AxlePosition.REAR),
                    request.choices().get(AxlePosition.REAR));
            long pairCount = (long) frontChoices.size() * rearChoices.size();
            if (pairCount > MAX_PAIRS) {
                throw new IllegalArgumentException(String.format(Locale.ROOT,
                        "%d front x %d rear bars make %d pairs, more than the %d a search tries: give fewer "
                                + "materials, sizes or holes", frontChoices.size(), rearChoices.size(), pairCount,
                        MAX_PAIRS));
            }
            total = frontChoices.size() + rearChoices.size() + pairCount;
            Map<Rejection, Long> rejections = new EnumMap<>(Rejection.class);
            List<Screened> fronts = screenAll(frontChoices, rejections);
            List<Screened> rears = screenAll(rearChoices, rejections);
            int rearCount = rears.size();
            long kept = (long) fronts.size() * rearCount;
            double[] miss = new double[(int) kept];
            IntStream.range(0, (int) kept).parallel().forEach(i -> {
                progress.checkCancelled();
                AxleState front = fronts.get(i / rearCount).state();
                AxleState rear = rears.get(i % rearCount).state();
                try {
                    RollBalance balance = evaluator.balance(front, rear);
                    miss[i] = request.targets().miss(balance.frontLoadTransferShare(), balance.rollGradient(),
                            staticFront);
                } catch (ImpossibleVehicleException unstable) {
                    miss[i] = Double.NaN;
                }
                tick();
            });
            long unstable = Arrays.stream(miss).filter(Double::isNaN).count();
            if (unstable > 0) {
                rejections.merge(Rejection.NO_STABLE_ROLL, unstable, Long::sum);
            }
            Integer[] order = IntStream.range(0, (int) kept).filter(i -> !Double.isNaN(miss[i])).boxed()
                    .toArray(Integer[]::new);
            Comparator<Integer> byMiss = (a, b) -> compareMisses(miss[a], miss[b]);
            Arrays.sort(order, byMiss.thenComparingDouble(i -> fronts.get(i / rearCount).state().barResult().mass()
                            + rears.get(i % rearCount).state().barResult().mass())
                    .thenComparingDouble(i -> miss[i]));
            // the limits need the full turn analysis: check them best first, until enough are found
            List<Candidate> found = new ArrayList<>();
            long accepted = 0;
            for (Integer i : order) {
                if (found.size() >= request.maxResults()) {
                    break;
                }
                progress.checkCancelled();
                Screened front = fronts.get(i / rearCount);
                Screened rear = rears.get(i % rearCount);
                Outcome outcome = full(front.state(), rear.state());
                if (outcome.rejection() != null) {
                    rejections.merge(outcome.rejection(), 1L, Long::sum);
                } else {
                    accepted++;
                    found.add(candidate(List.of(front.choice(), rear.choice()), outcome.figures()));
                }
            }
            progress.update(total, total);
            return new SizingResult(found, pairCount, accepted, rejections, targetShare(), reach);
        }

        private List<Screened> screenAll(List<BarChoice> choices, Map<Rejection, Long> rejections) {
            Screened[] screened = new Screened[choices.size()];
            IntStream.range(0, choices.size()).parallel().forEach(i -> {
                progress.checkCancelled();
                screened[i] = screen(choices.get(i));
                tick();
            });
            List<Screened> kept = new ArrayList<>();
            for (Screened one : screened) {
                if (one.rejection() == null) {
                    kept.add(one);
                } else {
                    rejections.merge(one.rejection(), 1L, Long::sum);
                }
            }
            return kept;
        }

        private Screened screen(BarChoice choice) {
            return BarSearch.screen(evaluator, constraints, choice);
        }

        /** The full figures and the lift checks. */
        private Outcome full(AxleState front, AxleState rear) {
            SetupFigures figures;
            try {
                figures = evaluator.figures(front, rear);
            } catch (ImpossibleVehicleException unstable) {
                return new Outcome(null, Rejection.NO_STABLE_ROLL);
            }
            for (AxlePosition axle : constraints.mustNotLiftBeforeLimit()) {
                if (figures.liftsBeforeLimit(axle)) {
                    return new Outcome(figures, axle == AxlePosition.FRONT ? Rejection.FRONT_LIFT : Rejection.REAR_LIFT);
                }
            }
            FatigueLimit limit = constraints.minimumLife();
            if (limit != null) {
                RollBalance balance = evaluator.balance(front, rear);
                for (AxlePosition axle : request.axles()) {
                    Rejection shortfall = fatigue(axle == AxlePosition.FRONT ? front : rear, balance, limit);
                    if (shortfall != null) {
                        return new Outcome(figures, shortfall);
                    }
                }
            }
            return new Outcome(figures, null);
        }

        /** @return why the sized bar falls short of the least life, or null where it lasts */
        private Rejection fatigue(AxleState state, RollBalance balance, FatigueLimit limit) {
            OptionalDouble laps = limit.lap().lapsToFailure(evaluator.vehicle(), state, balance);
            if (laps.isEmpty()) {
                return Rejection.NO_FATIGUE_DATA;
            }
            return laps.getAsDouble() < limit.minLaps() ? Rejection.FATIGUE_LIFE : null;
        }

        private Candidate candidate(List<BarChoice> bars, SetupFigures figures) {
            return new Candidate(bars, figures, request.targets().miss(figures.frontLoadTransferShare(),
                    figures.rollGradient(), staticFront));
        }

        private Comparator<Candidate> ranking() {
            Comparator<Candidate> byMiss = (a, b) -> compareMisses(a.miss(), b.miss());
            return byMiss.thenComparingDouble(Candidate::sizedBarMass).thenComparingDouble(Candidate::miss);
        }

        /** Misses compare after rounding to whole tie bands; with no band, exactly. */
        private int compareMisses(double first, double second) {
            double band = request.tieBand();
            return band > 0 ? Long.compare(Math.round(first / band), Math.round(second / band))
                    : Double.compare(first, second);
        }

        private double targetShare() {
            return request.targets().shareFor(staticFront);
        }

        private void tick() {
            long now = done.incrementAndGet();
            if (now % PROGRESS_EVERY == 0 || now == total) {
                progress.update(now, total);
            }
        }

        private static Map<Rejection, Long> count(Rejection[] rejected) {
            Map<Rejection, Long> counts = new EnumMap<>(Rejection.class);
            for (Rejection rejection : rejected) {
                if (rejection != null) {
                    counts.merge(rejection, 1L, Long::sum);
                }
            }
            return counts;
        }
    }

    /** The checks of one bar on its own: diameter, then mass and safety factor. */
    static Screened screen(SetupEvaluator evaluator, Constraints constraints, BarChoice choice) {
        Double maxDiameter = constraints.maxOuterDiameter();
        if (maxDiameter != null && choice.size().section().outerDiameter() > maxDiameter) {
            return new Screened(choice, null, Rejection.OUTER_DIAMETER);
        }
        AntiRollBar bar = choice.applyTo(evaluator.vehicle().axle(choice.axle()).bar());
        AxleState state = evaluator.axle(choice.axle(), bar);
        Double maxMass = constraints.maxBarMass();
        if (maxMass != null && state.barResult().mass() > maxMass) {
            return new Screened(choice, state, Rejection.BAR_MASS);
        }
        if (state.barResult().safetyFactor() < constraints.minSafetyFactor()) {
            return new Screened(choice, state, Rejection.SAFETY_FACTOR);
        }
        return new Screened(choice, state, null);
    }

    /** One bar and its axle, with why it was left out (null where it passed). */
    record Screened(BarChoice choice, AxleState state, Rejection rejection) {
    }

    private record Outcome(SetupFigures figures, Rejection rejection) {
    }
}
