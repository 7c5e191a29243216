package barwright.ui.document;

import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.List;

/** The sample vehicles built into the program (invented demonstration data, sample-vehicles/). */
public final class Samples {
    /** A sample: its resource name and a label for menus. */
    public record Sample(String resource, String label) {
    }

    /** The one the program opens on. */
    public static final Sample CLUB_HATCHBACK = new Sample("club-hatchback.json", "Club hatchback");
    public static final List<Sample> ALL = List.of(CLUB_HATCHBACK,
            new Sample("road-saloon.json", "Road saloon"),
            new Sample("sprint-roadster.json", "Sprint roadster"),
            new Sample("estate-dropped-rear-bar.json", "Estate, dropped rear bar (shaped)"),
            new Sample("hillclimb-special-swept-bar.json", "Hill-climb special, swept front bar (shaped)"),
            new Sample("club-hatchback-dampers.json", "Club hatchback with dampers (roll in motion)"));

    private static final String FOLDER = "/barwright/samples/";

    private Samples() {
    }

    /** @return the sample read from the classpath; a broken built-in sample is a build fault */
    public static VehicleDocument load(Sample sample) {
        try (InputStream in = Samples.class.getResourceAsStream(FOLDER + sample.resource())) {
            if (in == null) {
                throw new IllegalStateException("the built-in sample " + sample.resource() + " is missing");
            }
            return VehicleLoader.parse(in.readAllBytes());
        } catch (IOException unreadable) {
            throw new UncheckedIOException(unreadable);
        } catch (VehicleFileException refused) {
            throw new IllegalStateException("the built-in sample " + sample.resource() + " is refused: "
                    + refused.getMessage(), refused);
        }
    }

    /** @return a new document on the sample, with no file yet */
    public static OpenDocument open(Sample sample) {
        return new OpenDocument(load(sample), null, "sample: " + sample.label());
    }
}
