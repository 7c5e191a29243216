package barwright.sizing;

import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.model.BarSection;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.sizing.catalogue.StockSize;

import java.nio.file.Path;
import java.util.List;

/** Shared inputs: the shipped demo cars (invented data, used only as inputs, never as expected values). */
public final class SizingFixtures {
    private SizingFixtures() {
    }

    public static VehicleDocument hatchback() throws Exception {
        return VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json"));
    }

    public static VehicleDocument sample(String name) throws Exception {
        return VehicleLoader.read(Path.of("sample-vehicles/" + name));
    }

    /** A small catalogue: a few solids and tubes, enough to brute-force. */
    public static List<StockSize> smallCatalogue() {
        return List.of(size(new SolidSection(18e-3)), size(new SolidSection(20e-3)), size(new SolidSection(22e-3)),
                size(new SolidSection(24e-3)), size(new SolidSection(26e-3)), size(new TubeSection(25e-3, 2.5e-3)),
                size(new TubeSection(25.4e-3, 3e-3)), size(new TubeSection(28e-3, 3e-3)),
                size(new TubeSection(30e-3, 2e-3)));
    }

    static StockSize size(BarSection section) {
        return new StockSize(barwright.sizing.catalogue.CatalogueReader.defaultLabel(section), section);
    }
}
