package barwright.bench;

import barwright.model.AxlePosition;
import barwright.model.BarFatigueInputs;
import barwright.model.BarFatigueSettings;
import barwright.model.MaterialLibrary;
import barwright.physics.AnalysisPipeline;
import barwright.physics.AnalysisResult;
import barwright.physics.TestCars;
import barwright.physics.dynamics.RollState;
import barwright.physics.fatigue.BarStressHistory;
import barwright.physics.fatigue.FatigueAnalysis;
import barwright.physics.fatigue.FatigueResult;
import barwright.physics.fatigue.MeanStressCorrection;
import barwright.physics.fatigue.ReplayedStress;
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

import java.util.ArrayList;
import java.util.List;
import java.util.Random;
import java.util.concurrent.TimeUnit;

/**
 * An hour of lateral acceleration at 50 Hz (180,000 samples, invented: corners of random sign and size with noise)
 * through the bar's stress history, rainflow counting and Miner damage. Target under 300 ms. Two measurements:
 * {@code hourOfLog}, the a_y samples through the steady model's stress per a_y (as the sizing search takes a log);
 * {@code hourOfReplayedStates}, 180,000 states of the roll in motion (made in the set-up from the same a_y, so the
 * replay itself is NOT in the figure: model.md 14 measures it) turned into the bar's stress as {@code fatigue --log}
 * does, counted and summed. Run with
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
    private AnalysisResult analysis;
    private double[] lateralAcceleration;
    private List<RollState> states;
    private BarFatigueInputs inputs;

    @Setup
    public void load() {
        pipeline = new AnalysisPipeline(TestCars.clubCar());
        analysis = pipeline.analyse();
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
        // states as a replay records them; roll and transfer from the steady figures per a_y (the replay's own cost
        // is not part of this benchmark)
        double frontRoll = analysis.roll().frontRollPerAccel();
        double rearRoll = analysis.roll().rearRollPerAccel();
        double frontTransfer = analysis.front().loadTransfer().total();
        double rearTransfer = analysis.rear().loadTransfer().total();
        states = new ArrayList<>(lateralAcceleration.length);
        for (int i = 0; i < lateralAcceleration.length; i++) {
            double a = lateralAcceleration[i];
            states.add(new RollState(i / 50.0, a, frontRoll * a, rearRoll * a, frontRoll * a, frontTransfer * a,
                    rearTransfer * a, 3000, 3000, 2500, 2500));
        }
    }

    @Benchmark
    public FatigueResult hourOfLog() {
        double perAcceleration = BarStressHistory.stressPerAcceleration(pipeline, AxlePosition.FRONT);
        double[] history = BarStressHistory.fromSamples(lateralAcceleration, perAcceleration);
        return FatigueAnalysis.ofStressHistory(pipeline, AxlePosition.FRONT, inputs, MeanStressCorrection.GOODMAN,
                history, 3600);
    }

    @Benchmark
    public FatigueResult hourOfReplayedStates() {
        double[] history = ReplayedStress.fromStates(analysis, states, 3600).front();
        return FatigueAnalysis.ofStressHistory(pipeline, AxlePosition.FRONT, inputs, MeanStressCorrection.GOODMAN,
                history, 3600);
    }
}
