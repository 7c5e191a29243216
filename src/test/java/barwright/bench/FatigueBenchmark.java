package barwright.bench;

import barwright.model.AxlePosition;
import barwright.model.MaterialLibrary;
import barwright.physics.AnalysisPipeline;
import barwright.physics.TestCars;
import barwright.model.BarFatigueInputs;
import barwright.model.BarFatigueSettings;
import barwright.physics.fatigue.BarStressHistory;
import barwright.physics.fatigue.FatigueAnalysis;
import barwright.physics.fatigue.FatigueResult;
import barwright.physics.fatigue.MeanStressCorrection;
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

import java.util.Random;
import java.util.concurrent.TimeUnit;

/**
 * An hour of lateral acceleration at 50 Hz (180,000 samples, invented: corners of random sign and size with
 * noise) through the bar's stress history, rainflow counting and Miner damage. Target under 300 ms. Run with
 * {@code mvn -B -q test-compile exec:exec@bench -Dbench.args="FatigueBenchmark -f 1 -wi 3 -i 5 -w 1 -r 1"}.
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
@Fork(1)
public class FatigueBenchmark {
    private AnalysisPipeline pipeline;
    private double[] lateralAcceleration;
    private BarFatigueInputs inputs;

    @Setup
    public void load() {
        pipeline = new AnalysisPipeline(TestCars.clubCar());
        inputs = new BarFatigueInputs(MaterialLibrary.fatigueStrength("spring steel").orElseThrow(),
                BarFatigueSettings.DEFAULT);
        Random random = new Random(16);
        lateralAcceleration = new double[180_000];
        double peak = 0;
        for (int i = 0; i < lateralAcceleration.length; i++) {
            if (i % 250 == 0) {
                peak = (random.nextBoolean() ? 1 : -1) * (2 + 12 * random.nextDouble());
            }
            double shape = Math.sin(Math.PI * (i % 250) / 250.0);
            lateralAcceleration[i] = peak * shape + 0.3 * random.nextGaussian();
        }
    }

    @Benchmark
    public FatigueResult hourOfLog() {
        double perAcceleration = BarStressHistory.stressPerAcceleration(pipeline, AxlePosition.FRONT);
        double[] history = BarStressHistory.fromSamples(lateralAcceleration, perAcceleration);
        return FatigueAnalysis.ofStressHistory(pipeline, AxlePosition.FRONT, inputs, MeanStressCorrection.GOODMAN,
                history, 3600);
    }
}
