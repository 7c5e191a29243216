package barwright.report.tyre;

import barwright.io.TyreWriter;
import barwright.report.heading.OutputDocument;
import barwright.tyrefit.CurveFit;
import barwright.tyrefit.MagicFormula;
import barwright.tyrefit.TyreFit;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * The {@code barwright.tyre} document of {@code tyre-fit --json} (file-format.md, "Tyre fit"): the tyre object to
 * paste into a vehicle file and the fit behind it.
 */
public final class TyreFitJson {
    public static final String FORMAT = "barwright.tyre";
    public static final int VERSION = 1;

    private TyreFitJson() {
    }

    public static ObjectNode of(TyreFit fit) {
        ObjectNode root = OutputDocument.start(FORMAT, VERSION);
        root.set("tyre", TyreWriter.toJson(fit.tyre()));
        ObjectNode details = root.putObject("fit");
        details.put("method", "Magic Formula per curve by Levenberg-Marquardt least squares (model.md 8.3)");
        details.put("camberTermsFitted", fit.camberFitted());
        ArrayNode curves = details.putArray("curves");
        for (CurveFit curve : fit.curves()) {
            MagicFormula formula = curve.formula();
            ObjectNode entry = curves.addObject();
            entry.put("loadN", curve.load());
            entry.put("camberDeg", curve.camber() / RADIANS_PER_DEGREE);
            entry.put("firstLine", curve.firstLine());
            entry.put("lastLine", curve.lastLine());
            entry.put("points", curve.rows());
            entry.put("stiffnessFactorBPerDeg", formula.stiffnessFactor() * RADIANS_PER_DEGREE);
            entry.put("shapeFactorC", formula.shapeFactor());
            entry.put("peakDN", formula.peak());
            entry.put("curvatureFactorE", formula.curvatureFactor());
            entry.put("verticalShiftSvN", formula.verticalShift());
            entry.put("peakFriction", curve.peakFriction());
            entry.put("corneringStiffnessNPerDeg", formula.corneringStiffness() * RADIANS_PER_DEGREE);
            entry.put("rmsResidualN", curve.rmsResidual());
            entry.put("worstResidualN", curve.worstResidual());
            entry.put("worstResidualLine", curve.worstLine());
            entry.put("rmsResidualShareOfPeak", curve.rmsShareOfPeak());
            entry.put("worstResidualShareOfPeak", curve.worstShareOfPeak());
        }
        ArrayNode warnings = details.putArray("warnings");
        fit.warnings().forEach(warnings::add);
        return root;
    }
}
