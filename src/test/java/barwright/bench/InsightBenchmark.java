package barwright.bench;

import barwright.insight.ChassisStudy;
import barwright.insight.ChassisStudyResult;
import barwright.insight.LiftEnvelope;
import barwright.insight.LiftEnvelopeResult;
import barwright.insight.Sensitivity;
import barwright.insight.SensitivityResult;
import barwright.loading.VehicleLoader;
import barwright.model.Vehicle;
import barwright.physics.VehicleAnalysis;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/**
 * What each insight view costs to recompute after an edit, from the edited car to the finished result
 * (the full analysis included). Target: under 50 ms each (issue 6). Run:
 * {@code mvn -B -q test-compile exec:exec@bench -Dbench.args="InsightBenchmark -f 1 -wi 3 -i 5 -w 1 -r 1"}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class InsightBenchmark {
    @Param({"club-hatchback", "sprint-roadster"})
    public String sample;

    private Vehicle vehicle;

    @Setup
    public void load() throws Exception {
        vehicle = VehicleLoader.read(Path.of("sample-vehicles", sample + ".json")).vehicle();
    }

    @Benchmark
    public LiftEnvelopeResult envelope() {
        return LiftEnvelope.of(VehicleAnalysis.analyse(vehicle));
    }

    @Benchmark
    public SensitivityResult sensitivity() {
        return Sensitivity.of(vehicle);
    }

    @Benchmark
    public ChassisStudyResult chassis() {
        return ChassisStudy.compute(vehicle);
    }
}
