package barwright.bench;

import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.MaterialLibrary;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.Vehicle;
import barwright.sizing.BarSearch;
import barwright.sizing.Constraints;
import barwright.sizing.SizeChoices;
import barwright.sizing.SizingRequest;
import barwright.sizing.SizingResult;
import barwright.sizing.Targets;
import barwright.sizing.catalogue.StockSize;
import barwright.solver.Progress;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumSet;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * A sizing search over 10,000 candidates: 4 materials x 625 sizes x 4 arm holes of the rear bar of the
 * demo hatchback, with a safety-factor and a no-lift constraint (each candidate gets the full limit and
 * lift analysis). The search uses all cores (the common fork-join pool and the calling thread).
 * Run: mvn -B -q test-compile exec:exec@bench -Dbench.args="SizingBenchmark -f 1 -wi 3 -i 5 -w 1 -r 1"
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class SizingBenchmark {
    private Vehicle vehicle;
    private SizingRequest request;

    @Setup
    public void setUp() throws Exception {
        vehicle = VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json")).vehicle();
        List<StockSize> sizes = new ArrayList<>();
        // 25 solids (14 to 38 mm) and 600 tubes (25 diameters 16 to 40 mm x 24 walls 1.0 to 5.6 mm)
        for (int d = 14; d <= 38; d++) {
            sizes.add(new StockSize(d + " mm", new SolidSection(d * 1e-3)));
        }
        for (int d = 16; d <= 40; d++) {
            for (int w = 0; w < 24; w++) {
                double wall = 1.0 + 0.2 * w;
                sizes.add(new StockSize(d + " x " + wall, new TubeSection(d * 1e-3, wall * 1e-3)));
            }
        }
        List<Material> materials = MaterialLibrary.all();
        request = SizingRequest.of(AxlePosition.REAR, Targets.share(0.5),
                new Constraints(1.5, EnumSet.of(AxlePosition.REAR), null, null),
                new SizeChoices(materials, sizes, List.of()));
        long count = (long) materials.size() * sizes.size() * vehicle.rear().bar().holeCount();
        if (count != 10_000) {
            throw new IllegalStateException("the benchmark must try 10,000 candidates, not " + count);
        }
    }

    @Benchmark
    public SizingResult searchTenThousandCandidates() {
        return BarSearch.run(vehicle, request, Progress.NONE);
    }
}
