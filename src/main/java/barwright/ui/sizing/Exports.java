package barwright.ui.sizing;

import barwright.io.AtomicFileWriter;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.MassProperties;
import barwright.physics.VehicleAnalysis;
import barwright.report.sheet.SetupSheet;
import barwright.report.sheet.SheetContent;
import barwright.report.sizing.MapOutput;
import barwright.sizing.map.AdjustmentMap;
import barwright.ui.task.BackgroundWork;

import java.io.IOException;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Locale;
import java.util.function.Consumer;
import java.util.function.DoubleSupplier;

/**
 * The setup sheet (PDF) and the arm-hole map (CSV) written from the window for the car as it stands, off the
 * event thread; where to write is asked through the window's dialogs, failures are shown there too.
 */
final class Exports {
    private final SizingContext context;
    private DoubleSupplier referenceShare;

    Exports(SizingContext context) {
        this.context = context;
    }

    /** @param reference the front share the sheet's map is tinted around, or null for the rule of thumb */
    void useReference(DoubleSupplier reference) {
        referenceShare = reference;
    }

    /** Asks where, then writes the setup sheet; {@code done} hears where it was written. */
    void setupSheet(Consumer<String> done) {
        Vehicle vehicle = car("The setup sheet was not written");
        if (vehicle == null) {
            return;
        }
        Path target = target("setup-sheet", "pdf");
        if (target == null) {
            return;
        }
        double reference = referenceShare != null ? referenceShare.getAsDouble() : ruleOfThumb(vehicle);
        var units = context.view().units();
        run(done, "The setup sheet was not written", target, () -> {
            AnalysisResult result = VehicleAnalysis.analyse(vehicle);
            SheetContent usual = SetupSheet.contentFor(result, LocalDate.now(), units);
            SetupSheet.save(new SheetContent(result, usual.map(), reference, usual.charts(), usual.date(), units),
                    target);
        });
    }

    /** Asks where, then writes the arm-hole map as CSV. */
    void mapCsv(Consumer<String> done) {
        Vehicle vehicle = car("The map was not written");
        if (vehicle == null) {
            return;
        }
        Path target = target("arm-hole-map", "csv");
        if (target == null) {
            return;
        }
        run(done, "The map was not written", target, () -> {
            StringWriter text = new StringWriter();
            MapOutput.csv(AdjustmentMap.of(vehicle), text);
            AtomicFileWriter.writeText(target, text.toString());
        });
    }

    /** @return the static front weight plus 5 points (SheetContent's rule of thumb) */
    static double ruleOfThumb(Vehicle vehicle) {
        return MassProperties.of(vehicle).frontMassFraction() + SheetContent.RULE_OF_THUMB_OFFSET;
    }

    private Vehicle car(String failure) {
        try {
            return context.currentCar().vehicle();
        } catch (IllegalStateException refused) {
            context.dialogs().showError(failure, "It is written for the car as it stands, and " + refused.getMessage()
                    + ".");
            return null;
        }
    }

    private Path target(String stem, String extension) {
        Path file = context.document().file();
        String name = file == null ? stem : file.getFileName().toString().replaceFirst("\\.json$", "") + "-" + stem;
        Path chosen = context.dialogs().chooseFileToSave(name + "." + extension, extension);
        if (chosen == null) {
            return null;
        }
        String chosenName = chosen.getFileName().toString();
        return chosenName.toLowerCase(Locale.ROOT).endsWith("." + extension) ? chosen
                : chosen.resolveSibling(chosenName + "." + extension);
    }

    private interface Writing {
        void write() throws IOException;
    }

    private void run(Consumer<String> done, String failure, Path target, Writing writing) {
        BackgroundWork.start(progress -> {
            try {
                writing.write();
            } catch (IOException failed) {
                throw new UncheckedIOException(failed);
            }
            return target;
        }, new BackgroundWork.Listener<Void, Path>() {
            @Override
            public void finished(Void input, Path written) {
                done.accept("Wrote " + written);
            }

            @Override
            public void failed(Void input, String message) {
                context.dialogs().showError(failure, "It could not be written (" + message + "). Any file that was "
                        + "there is unchanged.");
            }
        });
    }
}
