package barwright.bench;

import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.io.IOException;
import java.io.InputStream;
import java.util.concurrent.TimeUnit;

/**
 * One full analysis of a sample vehicle: model.md 1-8, both turn directions, a handling curve of
 * {@link VehicleAnalysis#HANDLING_CURVE_POINTS} points each. Sample time mode, so the report gives the
 * median (p0.50) the issue asks for. Run with
 * {@code mvn -B -q test-compile exec:exec@bench -Dbench.args="AnalysisBenchmark -f 1 -wi 3 -i 5 -w 1 -r 1"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class AnalysisBenchmark {
    @Param({"club-hatchback", "road-saloon", "sprint-roadster"})
    public String sample;

    private Vehicle vehicle;

    @Setup
    public void load() throws IOException, VehicleFileException {
        try (InputStream in = AnalysisBenchmark.class.getResourceAsStream("/barwright/samples/" + sample + ".json")) {
            if (in == null) {
                throw new IllegalStateException("no built-in sample " + sample);
            }
            vehicle = VehicleLoader.parse(in.readAllBytes()).vehicle();
        }
    }

    @Benchmark
    public AnalysisResult fullAnalysis() {
        return VehicleAnalysis.analyse(vehicle);
    }
}
