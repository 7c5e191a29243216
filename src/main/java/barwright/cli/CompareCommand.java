package barwright.cli;

import barwright.io.AtomicFileWriter;
import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.report.sizing.ComparisonJson;
import barwright.report.sizing.ComparisonText;
import barwright.report.sizing.SweepOutput;
import barwright.sizing.compare.Comparison;
import barwright.sizing.compare.Configuration;
import barwright.units.UnitSystem;

import java.io.PrintStream;
import java.io.StringWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Set;

/**
 * {@code compare FILE [FILE...] [--variant "NAME: key.path=value; ..."]...}: two to four setups side by
 * side. A variant is the first file with changes made to it; {@code --variant} may be given more than once.
 */
final class CompareCommand implements Command {
    @Override
    public String name() {
        return "compare";
    }

    @Override
    public String synopsis() {
        return "compare FILE [FILE...] [--variant \"NAME: key.path=value; key.path=value\"]... [--csv OUT.csv] "
                + "[--json] [--units si|us]";
    }

    @Override
    public String summary() {
        return "compare 2 to 4 setups (saved files, or variants of the first file) figure by figure, with the "
                + "differences from the first; --csv writes the chart lines";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        List<String> variants = new ArrayList<>();
        List<String> rest = new ArrayList<>();
        for (int i = 0; i < args.size(); i++) {
            String arg = args.get(i);
            if (arg.equals("--variant")) {
                if (i + 1 >= args.size()) {
                    throw new UsageException("--variant needs a value: \"NAME: key.path=value; ...\"");
                }
                variants.add(args.get(++i));
            } else if (arg.startsWith("--variant=")) {
                variants.add(arg.substring("--variant=".length()));
            } else {
                rest.add(arg);
            }
        }
        Arguments parsed = Arguments.parse(rest, Set.of("json"), Set.of("csv", "units"));
        if (parsed.positional().isEmpty()) {
            throw new UsageException("give at least one vehicle file");
        }
        List<Configuration> configurations = new ArrayList<>();
        VehicleDocument first = null;
        for (String file : parsed.positional()) {
            VehicleDocument document = VehicleInput.read(file);
            first = first == null ? document : first;
            configurations.add(new Configuration(Path.of(file).getFileName().toString(), document.vehicle()));
        }
        for (String variant : variants) {
            int colon = variant.indexOf(':');
            if (colon <= 0) {
                throw new UsageException("--variant " + variant + ": write \"NAME: key.path=value; key.path=value\"");
            }
            List<String> edits = Arrays.stream(variant.substring(colon + 1).split(";")).map(String::trim)
                    .filter(edit -> !edit.isEmpty()).toList();
            VehicleDocument changed = VehicleLoader.withEdits(first, edits);
            configurations.add(new Configuration(variant.substring(0, colon).trim(), changed.vehicle()));
        }
        if (configurations.size() < Comparison.MIN_CONFIGURATIONS || configurations.size() > Comparison.MAX_CONFIGURATIONS) {
            throw new UsageException("compare 2 to 4 setups (files and variants together), not " + configurations.size());
        }
        Comparison comparison = Comparison.of(configurations);
        String csv = parsed.option("csv", null);
        if (csv != null) {
            StringWriter text = new StringWriter();
            SweepOutput.chartsCsv(comparison.charts(), text);
            AtomicFileWriter.writeText(Path.of(csv), text.toString());
        }
        UnitSystem units = parsed.units();
        Printed.jsonOrTextWithCaution(out, parsed, () -> ComparisonJson.of(comparison),
                () -> ComparisonText.of(comparison, units));
        return Cli.OK;
    }
}
