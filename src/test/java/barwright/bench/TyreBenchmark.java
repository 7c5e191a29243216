package barwright.bench;

import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.tyrefit.InventedTyreData;
import barwright.tyrefit.TyreFit;
import barwright.tyrefit.TyreFitException;
import barwright.tyrefit.TyreFitter;
import barwright.tyrefit.TyreMeasurement;
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

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * Tyres from data: a full analysis of the sample car on fitted tyres (points against load, camber terms;
 * target under 0.3 ms median) and a fit of 2,002 measured points (7 curves of 286; target under 200 ms). Run with
 * {@code mvn -B -q test-compile exec:exec@bench -Dbench.args="TyreBenchmark -f 1 -wi 3 -i 5 -w 1 -r 1"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class TyreBenchmark {
    private Vehicle vehicle;
    private List<TyreMeasurement> data;

    @Setup
    public void load() throws IOException, VehicleFileException {
        vehicle = VehicleLoader.parse(Files.readAllBytes(
                Path.of("sample-vehicles/club-hatchback-fitted-tyres.json"))).vehicle();
        data = InventedTyreData.generate(InventedTyreData.SEED, 286);
    }

    @Benchmark
    public AnalysisResult analysisWithTableTyres() {
        return VehicleAnalysis.analyse(vehicle);
    }

    @Benchmark
    public TyreFit fitOf2002Points() throws TyreFitException {
        return TyreFitter.fit(data);
    }
}
