package barwright.physics;

import barwright.physics.bar.BarResult;

/**
 * What one axle does: its stiffnesses and rates, its bar, its load transfer per a_y and its tyres' cornering
 * stiffness at static load.
 *
 * @param stiffness          roll stiffnesses and ride rates
 * @param bar                the bar's rate and stresses, or null for no bar
 * @param loadTransfer       load transfer per a_y in three parts, before any wheel lifts (N s^2/m)
 * @param corneringStiffness both tyres at their static loads (N/rad)
 * @param cornerSprungMass   half of (static axle load / g - unsprung axle mass) (kg)
 */
public record AxleResult(AxleStiffness stiffness, BarResult bar, LoadTransferParts loadTransfer,
                         double corneringStiffness, double cornerSprungMass) {
}
