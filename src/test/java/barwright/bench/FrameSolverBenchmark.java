package barwright.bench;

import barwright.model.AntiRollBar;
import barwright.model.BarCentreline;
import barwright.model.Material;
import barwright.model.Point3;
import barwright.model.SolidSection;
import barwright.physics.beam.BarFrame;
import barwright.physics.beam.BeamBar;
import barwright.physics.beam.BeamBarSolution;
import barwright.solver.frame.FrameModel;
import barwright.solver.frame.FrameSolution;
import barwright.solver.frame.FrameSolver;
import barwright.solver.frame.FrameSystem;
import barwright.solver.frame.NodalForce;
import org.ejml.data.DMatrixRMaj;
import org.ejml.interfaces.linsol.LinearSolverDense;
import org.ejml.dense.row.factory.LinearSolverFactory_DDRM;
import org.ejml.ops.DConvertMatrixStruct;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.State;
import org.openjdk.jmh.annotations.Warmup;

import java.util.List;
import java.util.concurrent.TimeUnit;

/**
 * The beam-element bar: the whole analysis (mesh, assemble, sparse Cholesky, solve, stresses) at 50, 200
 * and 800 elements, to show the cost growing in proportion; and, on the same 200-element frame, the sparse
 * solve against a dense LU of the same equations (EJML's dense LU, a blocked and well-tuned one).
 *
 * <p>Run: {@code mvn -B -q test-compile exec:exec@bench -Dbench.args="FrameSolver"}. One fork, three warm-up
 * and five measured iterations of one second (two cores: keep it short); read the p0.50 rows.
 */
@BenchmarkMode(Mode.SampleTime)
@OutputTimeUnit(TimeUnit.MICROSECONDS)
@Fork(1)
@Warmup(iterations = 3, time = 1)
@Measurement(iterations = 5, time = 1)
public class FrameSolverBenchmark {
    /** Invented steel values, typical of a bar (E, G in Pa; density kg/m^3; yield Pa). */
    private static final Material STEEL = new Material("steel", 205e9, 80e9, 7850, 1100e6);
    private static final double TRAVEL = 0.02;

    /**
     * A sharp-cornered U-bar whose five straight pieces (arm, overhang, span, overhang, arm: 240, 90, 840,
     * 90, 240 mm of a 1.5 m centreline) are whole multiples of 1.5 m / 50, so it meshes into exactly
     * 50, 200 or 800 equal elements.
     */
    static AntiRollBar bar() {
        List<Point3> points = List.of(new Point3(-0.24, 0.51, 0), new Point3(0, 0.51, 0), new Point3(0, -0.51, 0),
                new Point3(-0.24, -0.51, 0));
        BarCentreline centreline = new BarCentreline(points, 0, List.of(new Point3(0, 0.42, 0),
                new Point3(0, -0.42, 0)), null, List.of(0.0));
        return new AntiRollBar(STEEL, new SolidSection(0.024), null, centreline, 0, 0.7);
    }

    /** @return an element length that cuts the 1.5 m bar into {@code elements} pieces (a hair long, against round-off) */
    static double elementLength(int elements) {
        return 1.5 / elements * (1 + 1e-9);
    }

    @State(Scope.Benchmark)
    public static class WholeBar {
        @Param({"50", "200", "800"})
        public int elements;
        AntiRollBar bar;
        double elementLength;

        @Setup(Level.Trial)
        public void setUp() {
            bar = bar();
            elementLength = elementLength(elements);
            int meshed = BeamBar.solve(bar, TRAVEL, elementLength).elementCount();
            if (meshed != elements) {
                throw new IllegalStateException("the bar meshed into " + meshed + " elements, not " + elements);
            }
        }
    }

    @State(Scope.Benchmark)
    public static class SameFrame {
        FrameModel model;
        List<NodalForce> loads;

        @Setup(Level.Trial)
        public void setUp() {
            BarFrame frame = BeamBar.frameOf(bar(), elementLength(200));
            if (frame.model().elements().size() != 200) {
                throw new IllegalStateException("expected 200 elements, had " + frame.model().elements().size());
            }
            model = frame.model();
            loads = frame.unitLinkLoads();
        }
    }

    /** The whole bar analysis: mesh, assemble, factor, solve, stresses, bushing loads. */
    @Benchmark
    public BeamBarSolution beamBar(WholeBar state) {
        return BeamBar.solve(state.bar, TRAVEL, state.elementLength);
    }

    /** The 200-element frame: assemble, sparse Cholesky, solve, end forces and reactions. */
    @Benchmark
    public FrameSolution frameSparseCholesky(SameFrame state) {
        return FrameSolver.solve(state.model, state.loads);
    }

    /** The same 200-element frame: assemble, dense LU of the same equations, solve, end forces and reactions. */
    @Benchmark
    public FrameSolution frameDenseLu(SameFrame state) {
        FrameSystem system = FrameSystem.assemble(state.model);
        DMatrixRMaj dense = DConvertMatrixStruct.convert(system.stiffness(), (DMatrixRMaj) null);
        LinearSolverDense<DMatrixRMaj> lu = LinearSolverFactory_DDRM.lu(dense.numRows);
        if (!lu.setA(dense)) {
            throw new IllegalStateException("dense LU failed");
        }
        DMatrixRMaj solution = new DMatrixRMaj(dense.numRows, 1);
        lu.solve(system.loadVector(state.loads), solution);
        return system.results(solution, state.loads);
    }
}
