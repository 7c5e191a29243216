/**
 * Fitting a tyre from measured lateral force curves (model.md 8.3): the Magic Formula per load by
 * Levenberg-Marquardt, then peak friction and cornering stiffness against load as points, and the camber
 * terms where the camber varies. SI inside: N, rad.
 */
package barwright.tyrefit;
