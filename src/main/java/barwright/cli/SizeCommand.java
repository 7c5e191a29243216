package barwright.cli;

import barwright.io.AtomicFileWriter;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.io.VehicleFileWriter;
import barwright.loading.VehicleLoader;
import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.model.SolidSection;
import barwright.physics.Warnings;
import barwright.report.sizing.SizingJson;
import barwright.report.sizing.SizingText;
import barwright.report.sizing.SweepOutput;
import barwright.report.sizing.TubeOutput;
import barwright.sizing.BarSearch;
import barwright.sizing.Candidate;
import barwright.io.csv.CsvFileException;
import barwright.sizing.Constraints;
import barwright.sizing.FatigueLap;
import barwright.sizing.TubeLives;
import barwright.sizing.DiameterSweep;
import barwright.sizing.ExactSize;
import barwright.sizing.ExactSolution;
import barwright.sizing.SetupEvaluator;
import barwright.sizing.SizeChoices;
import barwright.sizing.SizingRequest;
import barwright.sizing.SizingResult;
import barwright.sizing.Targets;
import barwright.sizing.TubeEquivalents;
import barwright.sizing.catalogue.Catalogue;
import barwright.sizing.catalogue.CatalogueFileException;
import barwright.sizing.catalogue.Catalogues;
import barwright.sizing.catalogue.StockSize;
import barwright.solver.Progress;
import barwright.units.UnitSystem;

import java.io.PrintStream;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.EnumSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * {@code size FILE ...}: the bars from stock sizes that meet a target, ranked; the exact solid diameter; or,
 * with {@code --tubes-like-solid}, the tubes of equal rate to a solid bar.
 */
final class SizeCommand implements Command {
    static final Set<String> SWITCHES = Set.of("json");
    static final Set<String> OPTIONS = Set.of("axle", "target-share", "target-offset", "target-gradient",
            "min-safety", "no-lift", "max-mass", "max-diameter", "materials", "catalogues", "holes", "count",
            "tie-band", "tube-diameter", "sweep-csv", "apply", "output", "tubes-like-solid", "units", "min-laps",
            "fatigue-log");

    @Override
    public String name() {
        return "size";
    }

    @Override
    public String synopsis() {
        return "size FILE --axle front|rear|both (--target-share S | --target-offset D) [--target-gradient DEG_PER_G]"
                + " [--min-safety 1.5] [--no-lift none|front|rear|both] [--max-mass KG] [--max-diameter MM]"
                + " [--min-laps N [--fatigue-log LAP.csv]]"
                + " [--materials current|all|NAME,...] [--catalogues NAME|PATH,...] [--holes 1,2,...] [--count 10]"
                + " [--tie-band 0.1] [--tube-diameter MM] [--sweep-csv OUT.csv] [--apply RANK --output OUT.json]"
                + " [--tubes-like-solid current|MM] [--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "size a bar (or both) from stock sizes to a front share and/or roll gradient, ranked closest then "
                + "lightest, with the exact solid diameter; or list tubes of equal rate to a solid bar";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, SWITCHES, OPTIONS);
        VehicleDocument document = VehicleInput.read(parsed.onlyPositional("vehicle file"));
        UnitSystem units = parsed.units();
        List<AxlePosition> axles = axles(parsed.option("axle", null));
        Map<AxlePosition, List<Material>> materials = new EnumMap<>(AxlePosition.class);
        for (AxlePosition axle : axles) {
            AntiRollBar bar = requireBar(document, axle);
            materials.put(axle, materials(parsed.option("materials", "current"), bar));
        }
        List<StockSize> sizes = sizes(parsed.option("catalogues", String.join(",", Catalogues.BUILT_IN)));
        if (parsed.option("tubes-like-solid", null) != null) {
            return tubesLikeSolid(parsed, document, axles, materials, sizes, units, out);
        }
        Targets targets = targets(parsed);
        Constraints constraints;
        try {
            constraints = constraints(parsed).withMinimumLife(MinimumLifeOption.read(parsed, document));
        } catch (CsvFileException refused) {
            err.println("barwright: the log " + parsed.option("fatigue-log", "") + " was refused:");
            refused.problems().forEach(problem -> err.println("  " + problem));
            return Cli.REFUSED;
        }
        Map<AxlePosition, SizeChoices> choices = new EnumMap<>(AxlePosition.class);
        List<Integer> holes = holes(parsed.option("holes", null));
        for (AxlePosition axle : axles) {
            choices.put(axle, new SizeChoices(materials.get(axle), sizes, holes));
        }
        SizingRequest request;
        try {
            request = new SizingRequest(axles, targets, constraints, choices,
                    (int) positive(parsed, "count", SizingRequest.DEFAULT_MAX_RESULTS),
                    parsed.number("tie-band", SizingRequest.DEFAULT_TIE_BAND));
        } catch (IllegalArgumentException bad) {
            throw new UsageException(bad.getMessage());
        }
        SizingResult result;
        try {
            result = BarSearch.run(document.vehicle(), request, new StderrProgress(err, !parsed.has("json")));
        } catch (IllegalArgumentException bad) {
            throw new UsageException(bad.getMessage());
        }
        SetupEvaluator evaluator = new SetupEvaluator(document.vehicle());
        ExactSolution exactSolid = null;
        ExactSolution exactWall = null;
        if (axles.size() == 1) {
            AxlePosition axle = axles.get(0);
            int hole = holes.isEmpty() ? document.vehicle().axle(axle).bar().selectedArm() : holes.get(0);
            Material material = materials.get(axle).get(0);
            exactSolid = ExactSize.solidDiameter(evaluator, axle, material, hole, targets);
            if (parsed.option("tube-diameter", null) != null) {
                exactWall = ExactSize.tubeWall(evaluator, axle, material, hole,
                        positive(parsed, "tube-diameter", 0) * 1e-3, targets);
            }
            String sweepFile = parsed.option("sweep-csv", null);
            if (sweepFile != null) {
                StringWriter csv = new StringWriter();
                SweepOutput.diameterCsv(DiameterSweep.of(evaluator, axle, material, hole, 10e-3, 40e-3, 60),
                        axle == AxlePosition.FRONT, csv);
                AtomicFileWriter.writeText(Path.of(sweepFile), csv.toString());
            }
        }
        applyCandidate(parsed, document, result);
        ExactSolution solid = exactSolid;
        ExactSolution wall = exactWall;
        Printed.jsonOrTextWithCaution(out, parsed, () -> SizingJson.of(request, result, solid, wall),
                () -> SizingText.of(request, result, solid, wall, units));
        return Cli.OK;
    }

    private static void applyCandidate(Arguments parsed, VehicleDocument document, SizingResult result)
            throws Exception {
        String apply = parsed.option("apply", null);
        String output = parsed.option("output", null);
        if (apply == null && output == null) {
            return;
        }
        if (apply == null || output == null) {
            throw new UsageException("--apply RANK and --output FILE go together");
        }
        int rank = (int) positive(parsed, "apply", 1);
        if (rank > result.candidates().size()) {
            throw new UsageException("--apply " + rank + ": the search found " + result.candidates().size()
                    + " candidates");
        }
        Candidate candidate = result.candidates().get(rank - 1);
        VehicleFileWriter.save(VehicleLoader.withBars(document, candidate.settings()), Path.of(output));
    }

    private int tubesLikeSolid(Arguments parsed, VehicleDocument document, List<AxlePosition> axles,
                               Map<AxlePosition, List<Material>> materials, List<StockSize> sizes, UnitSystem units,
                               PrintStream out) throws UsageException, VehicleFileException {
        if (axles.size() != 1) {
            throw new UsageException("--tubes-like-solid matches one axle's bar: give --axle front or rear");
        }
        AxlePosition axle = axles.get(0);
        AntiRollBar bar = document.vehicle().axle(axle).bar();
        String solid = parsed.option("tubes-like-solid", "current");
        AntiRollBar solidBar;
        if (solid.equals("current")) {
            if (!(bar.section() instanceof SolidSection)) {
                throw new UsageException("the " + axle.key() + " bar is a tube: give --tubes-like-solid MM, the "
                        + "diameter of the solid bar to match");
            }
            solidBar = bar;
        } else {
            solidBar = bar.withSection(new SolidSection(positive(parsed, "tubes-like-solid", 0) * 1e-3));
        }
        TubeEquivalents.Comparison comparison = TubeEquivalents.compare(solidBar,
                document.vehicle().differentialWheelTravel(), sizes, materials.get(axle),
                TubeEquivalents.DEFAULT_TOLERANCE);
        TubeLives lives = TubeLives.of(document.vehicle(), axle, comparison, FatigueLap.onDefaultLap(document));
        Printed.jsonOrTextWithCaution(out, parsed, () -> TubeOutput.json(comparison, lives),
                () -> TubeOutput.text(comparison, lives, units));
        return Cli.OK;
    }

    static List<AxlePosition> axles(String axle) throws UsageException {
        if (axle == null) {
            throw new UsageException("say which bar to size: --axle front, rear or both");
        }
        return switch (axle) {
            case "front" -> List.of(AxlePosition.FRONT);
            case "rear" -> List.of(AxlePosition.REAR);
            case "both" -> List.of(AxlePosition.FRONT, AxlePosition.REAR);
            default -> throw new UsageException("--axle " + axle + ": must be front, rear or both");
        };
    }

    /** @return the materials named: "current" (the bar's own), "all" (the library and the bar's own), or names */
    static List<Material> materials(String names, AntiRollBar bar) throws UsageException {
        Set<Material> chosen = new LinkedHashSet<>();
        for (String name : names.split(",")) {
            String trimmed = name.trim();
            if (trimmed.equals("current")) {
                chosen.add(bar.material());
            } else if (trimmed.equals("all")) {
                chosen.add(bar.material());
                chosen.addAll(MaterialLibrary.all());
            } else {
                chosen.add(MaterialLibrary.byName(trimmed).orElseThrow(() -> new UsageException("--materials: '"
                        + trimmed + "' is not a built-in material; use current, all, or "
                        + String.join(", ", MaterialLibrary.names()))));
            }
        }
        return new ArrayList<>(chosen);
    }

    /** @return every size of the catalogues named (built-in names or paths), in order */
    static List<StockSize> sizes(String catalogues) throws Exception {
        List<StockSize> sizes = new ArrayList<>();
        for (String name : catalogues.split(",")) {
            try {
                Catalogue catalogue = Catalogues.find(name.trim());
                sizes.addAll(catalogue.sizes());
            } catch (CatalogueFileException refused) {
                throw new UsageException("catalogue '" + name.trim() + "' refused:\n  "
                        + refused.getMessage().replace("\n", "\n  "));
            }
        }
        return sizes;
    }

    /** @return 0-based holes from the 1-based list people type, or empty for all */
    static List<Integer> holes(String list) throws UsageException {
        if (list == null) {
            return List.of();
        }
        List<Integer> holes = new ArrayList<>();
        for (String item : list.split(",")) {
            try {
                int hole = Integer.parseInt(item.trim());
                if (hole < 1) {
                    throw new NumberFormatException();
                }
                holes.add(hole - 1);
            } catch (NumberFormatException bad) {
                throw new UsageException("--holes " + list + ": give hole numbers from 1, separated by commas");
            }
        }
        return holes;
    }

    static Targets targets(Arguments parsed) throws UsageException {
        Double share = optional(parsed, "target-share");
        Double offset = optional(parsed, "target-offset");
        Double gradient = optional(parsed, "target-gradient");
        try {
            return new Targets(share, offset,
                    gradient == null ? null : gradient * RADIANS_PER_DEGREE / STANDARD_GRAVITY);
        } catch (IllegalArgumentException bad) {
            throw new UsageException(bad.getMessage() + " (--target-share, --target-offset, --target-gradient)");
        }
    }

    static Constraints constraints(Arguments parsed) throws UsageException {
        Set<AxlePosition> noLift = switch (parsed.option("no-lift", "none")) {
            case "none" -> Set.of();
            case "front" -> EnumSet.of(AxlePosition.FRONT);
            case "rear" -> EnumSet.of(AxlePosition.REAR);
            case "both" -> EnumSet.allOf(AxlePosition.class);
            default -> throw new UsageException("--no-lift " + parsed.option("no-lift", "")
                    + ": must be none, front, rear or both");
        };
        Double maxDiameter = optional(parsed, "max-diameter");
        try {
            return new Constraints(parsed.number("min-safety", Warnings.LOW_SAFETY_FACTOR), noLift,
                    optional(parsed, "max-mass"), maxDiameter == null ? null : maxDiameter * 1e-3);
        } catch (IllegalArgumentException bad) {
            throw new UsageException(bad.getMessage());
        }
    }

    static Double optional(Arguments parsed, String name) throws UsageException {
        return parsed.option(name, null) == null ? null : parsed.number(name, 0);
    }

    static double positive(Arguments parsed, String name, double fallback) throws UsageException {
        double value = parsed.number(name, fallback);
        if (!(value > 0)) {
            throw new UsageException("--" + name + " = " + parsed.option(name, "") + ": must be positive");
        }
        return value;
    }

    /** @return the axle's bar, refusing an axle with none with a message for people */
    static AntiRollBar requireBar(VehicleDocument document, AxlePosition axle) throws UsageException {
        AntiRollBar bar = document.vehicle().axle(axle).bar();
        if (bar == null) {
            throw new UsageException("the " + axle.key() + " axle has no bar: give its bar in the vehicle file "
                    + "(torsion length, arm lengths, link motion ratio); the search picks material, section "
                    + "and hole");
        }
        return bar;
    }

    /** Progress on standard error for searches that take more than a moment; silent for scripts. */
    static final class StderrProgress implements Progress {
        private static final long QUIET_NANOS = 1_000_000_000L;
        private final PrintStream err;
        private final boolean enabled;
        private final long start = System.nanoTime();
        private long lastPrinted;

        StderrProgress(PrintStream err, boolean enabled) {
            this.err = err;
            this.enabled = enabled;
        }

        @Override
        public synchronized void update(long done, long total) {
            long now = System.nanoTime();
            if (!enabled || now - start < QUIET_NANOS || now - lastPrinted < QUIET_NANOS / 2) {
                return;
            }
            lastPrinted = now;
            err.printf(Locale.ROOT, "searching: %d of %d (%.0f %%)%n", done, total, 100.0 * done / total);
        }

        @Override
        public boolean isCancelled() {
            return false;
        }
    }
}
