package barwright.cli;

import com.fasterxml.jackson.core.json.JsonReadFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.json.JsonMapper;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.Random;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * Runs mutated sample vehicle files through the {@code analyze} command exactly as a user would (a file on
 * disk, {@link Cli#run}, the JSON report and the readable summary) and sorts each case into refused,
 * analysed or a defect. A defect is: an internal failure (exit 1), a refusal that names neither a key path
 * nor a line and column, or a report or summary with NaN or Infinity in it.
 */
public final class FuzzCampaign {
    /** The sample vehicles every mutation starts from. */
    static final Path SAMPLES = Path.of("sample-vehicles");

    /** A problem line of a refusal that locates itself: a key path first, or a line and column. */
    private static final Pattern KEY_PATH = Pattern.compile(
            "^(format|version|name|notes|vehicle|front|rear|analysis)([.\\[][^ ]*)? .*", Pattern.DOTALL);
    private static final Pattern LINE_AND_COLUMN = Pattern.compile(".*line \\d+, column \\d+.*", Pattern.DOTALL);
    /** Refusals of the file as a whole, where no key or place could be named. */
    private static final List<String> WHOLE_FILE = List.of("the file is empty", "the file must hold one JSON object",
            "the file is larger than", "the file is UTF-16 text");
    private static final Pattern NON_FINITE_TEXT = Pattern.compile("\\bNaN\\b|Infinity|∞");

    private static final ObjectMapper LENIENT = JsonMapper.builder()
            .enable(JsonReadFeature.ALLOW_NON_NUMERIC_NUMBERS).build();

    /**
     * The counts of a campaign, and the first defects found (with the seed that reproduces each).
     */
    record Counts(int cases, int refused, int analysed, int defects, List<String> defectCases,
                  Map<String, Integer> defectKinds) {
        @Override
        public String toString() {
            return String.format("cases %d, refused %d, analysed %d, defects %d", cases, refused, analysed, defects);
        }
    }

    private FuzzCampaign() {
    }

    /**
     * @param firstSeed the seed of the first case; case i uses firstSeed + i
     * @param cases     how many mutated files
     * @param workDir   a folder for the mutated files
     */
    static Counts run(long firstSeed, int cases, Path workDir) {
        return run(firstSeed, cases, workDir, "analyze");
    }

    /**
     * @param command a command that takes one vehicle file and {@code --json}: analyze, envelope,
     *                sensitivity or chassis
     */
    static Counts run(long firstSeed, int cases, Path workDir, String command) {
        List<Sample> samples = samples();
        int refused = 0;
        int analysed = 0;
        int defects = 0;
        List<String> defectCases = new ArrayList<>();
        Map<String, Integer> kinds = new TreeMap<>();
        Path file = workDir.resolve("mutant.json");
        for (int i = 0; i < cases; i++) {
            long seed = firstSeed + i;
            Random random = new Random(seed);
            Sample sample = samples.get(random.nextInt(samples.size()));
            VehicleFileMutations.Mutant mutant = VehicleFileMutations.mutate(sample.name(), sample.tree(), random);
            write(file, mutant.content());
            String defect;
            CommandRun json = CommandRun.of(command, file.toString(), "--json");
            if (json.exitCode() == Cli.REFUSED) {
                refused++;
                defect = vagueRefusal(json.err());
            } else if (json.exitCode() == Cli.OK) {
                analysed++;
                defect = nonFiniteReport(json.out());
                if (defect == null) {
                    // the summary in both unit systems, alternately
                    CommandRun text = CommandRun.of(command, file.toString(), "--units", seed % 2 == 0 ? "si" : "us");
                    defect = NON_FINITE_TEXT.matcher(text.out()).find()
                            ? "the summary holds a non-finite number: " + excerpt(text.out()) : null;
                }
            } else {
                defect = "exit " + json.exitCode() + ": " + json.err().strip();
            }
            if (defect != null) {
                defects++;
                kinds.merge(defect.length() > 90 ? defect.substring(0, 90) : defect, 1, Integer::sum);
                if (defectCases.size() < 50) {
                    defectCases.add("seed " + seed + " (" + mutant.description() + "): " + defect);
                }
            }
        }
        return new Counts(cases, refused, analysed, defects, defectCases, kinds);
    }

    /** @return why a refusal does not say where the problem is, or null where every line does */
    private static String vagueRefusal(String err) {
        String[] lines = err.split("\n");
        if (lines.length == 0) {
            return "refused with no message";
        }
        if (lines[0].startsWith("barwright: this car cannot be analysed: ")) {
            return null; // an impossible car: the message names the cause and its figures
        }
        if (!lines[0].startsWith("barwright: the vehicle file was refused:") || lines.length < 2) {
            return "refused without the usual heading: " + excerpt(err);
        }
        for (int i = 1; i < lines.length; i++) {
            String problem = lines[i].strip();
            boolean located = KEY_PATH.matcher(problem).matches() || LINE_AND_COLUMN.matcher(problem).matches()
                    || WHOLE_FILE.stream().anyMatch(problem::startsWith);
            if (!located) {
                return "a problem names no key path, line or column: " + excerpt(problem);
            }
        }
        return null;
    }

    /** @return where the JSON report holds NaN or Infinity (as a number or as a string), or null */
    private static String nonFiniteReport(String out) {
        JsonNode report;
        try {
            report = LENIENT.readTree(out);
        } catch (IOException notJson) {
            return "the report is not JSON: " + excerpt(out);
        }
        List<String> found = new ArrayList<>();
        findNonFinite(report, "", found);
        return found.isEmpty() ? null : "non-finite numbers in the report at " + found;
    }

    private static void findNonFinite(JsonNode node, String path, List<String> found) {
        if (node.isNumber() && !Double.isFinite(node.doubleValue())) {
            found.add(path);
        } else if (node.isTextual() && NON_FINITE_TEXT.matcher(node.textValue()).find()
                && !path.endsWith("message")) {
            found.add(path);
        } else if (node.isObject()) {
            node.fieldNames().forEachRemaining(key -> findNonFinite(node.get(key), path + "." + key, found));
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                findNonFinite(node.get(i), path + "[" + i + "]", found);
            }
        }
    }

    private static String excerpt(String text) {
        String line = text.replace('\n', ' ');
        return line.length() > 300 ? line.substring(0, 300) + "..." : line;
    }

    private record Sample(String name, JsonNode tree) {
    }

    private static List<Sample> samples() {
        ObjectMapper mapper = new ObjectMapper();
        try (Stream<Path> files = Files.list(SAMPLES)) {
            List<Sample> samples = new ArrayList<>();
            for (Path path : files.filter(p -> p.toString().endsWith(".json")).sorted().toList()) {
                samples.add(new Sample(path.getFileName().toString(), mapper.readTree(path.toFile())));
            }
            return samples;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void write(Path file, byte[] content) {
        try {
            Files.write(file, content);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Runs a campaign from the command line: {@code FuzzCampaign [cases] [first seed] [command]}. */
    public static void main(String[] args) throws IOException {
        int cases = args.length > 0 ? Integer.parseInt(args[0]) : 10_000;
        long seed = args.length > 1 ? Long.parseLong(args[1]) : 1;
        Path dir = Files.createTempDirectory("barwright-fuzz");
        long start = System.nanoTime();
        Counts counts = run(seed, cases, dir, args.length > 2 ? args[2] : "analyze");
        System.out.println(counts + String.format(" (%.1f s)", (System.nanoTime() - start) / 1e9));
        counts.defectKinds().forEach((kind, count) -> System.out.println(count + " x " + kind));
        counts.defectCases().forEach(System.out::println);
        Files.deleteIfExists(dir.resolve("mutant.json"));
        Files.deleteIfExists(dir);
    }
}
