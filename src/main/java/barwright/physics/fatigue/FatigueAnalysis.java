package barwright.physics.fatigue;

import barwright.model.BarFatigueInputs;
import barwright.model.SpectrumLevel;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.physics.AnalysisPipeline;

import java.util.List;

/** "Will the bar last the season?": a bar's stress history to its life (docs/model.md 13). */
public final class FatigueAnalysis {
    private FatigueAnalysis() {
    }

    /**
     * @param pipeline   the car's analysis
     * @param position   which bar
     * @param inputs     its fatigue data
     * @param correction the mean-stress correction
     * @param spectrum   one lap's corners
     * @param lapSeconds the lap's duration (s)
     */
    public static FatigueResult ofSpectrum(AnalysisPipeline pipeline, AxlePosition position, BarFatigueInputs inputs,
                                           MeanStressCorrection correction, List<SpectrumLevel> spectrum,
                                           double lapSeconds) {
        double perAcceleration = BarStressHistory.stressPerAcceleration(pipeline, position);
        double[] history = BarStressHistory.fromSpectrum(spectrum, perAcceleration);
        return ofStressHistory(pipeline, position, inputs, correction, history, lapSeconds);
    }

    /**
     * @param history one lap's signed nominal von Mises stress at the bar's most stressed station (Pa), at least
     *                two points
     */
    public static FatigueResult ofStressHistory(AnalysisPipeline pipeline, AxlePosition position,
                                                BarFatigueInputs inputs, MeanStressCorrection correction,
                                                double[] history, double lapSeconds) {
        AntiRollBar bar = pipeline.vehicle().axle(position).bar();
        if (bar == null) {
            throw new IllegalArgumentException("the " + position.key() + " axle has no bar");
        }
        SnCurve curve = SnCurve.of(inputs.strength(), inputs.settings().surface(), bar.section().outerDiameter());
        double checkStress = pipeline.barResult(bar).maxVonMisesStress();
        return FatigueLife.assess(Rainflow.count(history), curve, inputs.settings().stressConcentration(),
                correction, checkStress, lapSeconds);
    }
}
