package barwright.tyrefit;

import barwright.model.LoadTable;
import barwright.model.Tyre;
import barwright.model.TyreCamber;

import java.util.List;

/**
 * A tyre fitted from measured curves (model.md 8.3).
 *
 * @param curves            every fitted curve, by load then camber
 * @param nominalLoad       F_z0: the measured load nearest the middle of the loads (N)
 * @param frictionPoints    peak friction at the best camber against load
 * @param stiffnessPoints   cornering stiffness (N/rad) against load
 * @param shapeFactor       C, the mean over the zero-camber curves
 * @param curvatureFactor   E, the mean over the zero-camber curves
 * @param camber            the camber terms, {@link TyreCamber#NONE} where the camber did not vary enough
 * @param camberFitted      whether the data gave camber terms
 * @param warnings          things the user should know about the data or the fit
 */
public record TyreFit(List<CurveFit> curves, double nominalLoad, LoadTable frictionPoints, LoadTable stiffnessPoints,
                     double shapeFactor, double curvatureFactor, TyreCamber camber, boolean camberFitted,
                     List<String> warnings) {
    public TyreFit {
        curves = List.copyOf(curves);
        warnings = List.copyOf(warnings);
    }

    /** @return the fitted tyre, friction and cornering stiffness as points */
    public Tyre tyre() {
        // the law values are placeholders, replaced by the points' stand-ins (model.Tyre)
        return new Tyre(nominalLoad, 1, 0, 10, 2, shapeFactor, curvatureFactor).withCamber(camber)
                .withFrictionByLoad(frictionPoints).withCorneringStiffnessByLoad(stiffnessPoints);
    }
}
