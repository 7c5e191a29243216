package barwright.bench;

import barwright.io.DynamicsInputReader;
import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.model.DynamicsInputs;
import barwright.model.LapLog;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.physics.dynamics.LateralInput;
import barwright.physics.dynamics.TransientAnalysis;
import barwright.physics.dynamics.TransientResult;
import barwright.units.Conversions;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;

import java.nio.file.Path;
import java.util.concurrent.TimeUnit;

/**
 * The roll in motion (model.md 14): 3 s of a step response (target under 5 ms) and a 20-minute log at 50 Hz,
 * 60,000 samples, replayed (target under 1 s). The log is the shipped invented lap's a_y repeated with a
 * seeded jitter, invented data. Run:
 * {@code mvn -B -q test-compile exec:exec@bench -Dbench.args="TransientBenchmark -f 1 -wi 3 -i 5 -w 1 -r 1"}
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
public class TransientBenchmark {
    private AnalysisResult analysis;
    private DynamicsInputs inputs;
    private LapLog longLog;

    @Setup
    public void load() throws Exception {
        VehicleDocument document = VehicleLoader.read(Path.of("sample-vehicles/club-hatchback-dampers.json"));
        analysis = VehicleAnalysis.analyse(document.vehicle());
        inputs = DynamicsInputReader.read(document.tree());
        int samples = 60_000;
        double[] times = new double[samples];
        double[] lateral = new double[samples];
        double[] longitudinal = new double[samples];
        java.util.Random jitter = new java.util.Random(7);
        for (int i = 0; i < samples; i++) {
            times[i] = i / 50.0;
            // corners of 0.6-1.0 g every 8 s, 0.02 g of noise: an invented stand-in for a logger's export
            double phase = times[i] % 8;
            double shape = phase < 1 ? phase : phase < 4 ? 1 : phase < 5 ? 5 - phase : 0;
            double sign = ((int) (times[i] / 8)) % 2 == 0 ? 1 : -1;
            lateral[i] = Conversions.fromG(sign * (0.6 + 0.4 * ((i / 400) % 3) / 2.0) * shape
                    + 0.02 * jitter.nextGaussian());
        }
        longLog = new LapLog(times, lateral, longitudinal, null);
    }

    @Benchmark
    public TransientResult stepOfThreeSeconds() {
        return TransientAnalysis.step(analysis, inputs, new LateralInput.Step(Conversions.fromG(0.9), 0.1), 3);
    }

    @Benchmark
    public TransientResult twentyMinuteLog() {
        return TransientAnalysis.log(analysis, inputs, longLog, 1200);
    }
}
