package barwright.cli;

import barwright.io.AtomicFileWriter;
import barwright.io.VehicleDocument;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.sheet.SetupSheet;
import barwright.report.sheet.SheetContent;
import barwright.report.sizing.MapOutput;

import java.io.PrintStream;
import java.io.StringWriter;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Set;

/** {@code sheet FILE --output OUT.pdf ...}: the setup sheet to print and take to the track. */
final class SheetCommand implements Command {
    @Override
    public String name() {
        return "sheet";
    }

    @Override
    public String synopsis() {
        return "sheet FILE --output OUT.pdf [--target-share S | --target-offset D] [--map-csv OUT.csv] "
                + "[--date YYYY-MM-DD] [--units si|us]";
    }

    @Override
    public String summary() {
        return "write the setup sheet as PDF: the car, both bars drawn, key figures, a block for the crew, the "
                + "adjustment map, charts, the date and the cautions";
    }

    @Override
    public int run(List<String> args, PrintStream out, PrintStream err) throws Exception {
        Arguments parsed = Arguments.parse(args, Set.of(), Set.of("output", "target-share", "target-offset", "map-csv",
                "date", "units"));
        VehicleDocument document = VehicleInput.read(parsed.onlyPositional("vehicle file"));
        String output = parsed.option("output", null);
        if (output == null) {
            throw new UsageException("give --output OUT.pdf, the file to write");
        }
        LocalDate date;
        try {
            date = LocalDate.parse(parsed.option("date", LocalDate.now().toString()));
        } catch (DateTimeParseException bad) {
            throw new UsageException("--date " + parsed.option("date", "") + ": write it as YYYY-MM-DD");
        }
        AnalysisResult result = VehicleAnalysis.analyse(document.vehicle());
        SheetContent usual = SetupSheet.contentFor(result, date, parsed.units());
        double reference = usual.referenceShare();
        Double share = SizeCommand.optional(parsed, "target-share");
        Double offset = SizeCommand.optional(parsed, "target-offset");
        if (share != null && offset != null) {
            throw new UsageException("give --target-share or --target-offset, not both");
        }
        if (share != null) {
            reference = share;
        } else if (offset != null) {
            reference = result.masses().frontMassFraction() + offset;
        }
        SheetContent content = new SheetContent(result, usual.map(), reference, usual.charts(), date, usual.units());
        SetupSheet.save(content, Path.of(output));
        String mapCsv = parsed.option("map-csv", null);
        if (mapCsv != null) {
            StringWriter text = new StringWriter();
            MapOutput.csv(content.map(), text);
            AtomicFileWriter.writeText(Path.of(mapCsv), text.toString());
        }
        out.println("wrote " + output + (mapCsv == null ? "" : " and " + mapCsv));
        return Cli.OK;
    }
}
