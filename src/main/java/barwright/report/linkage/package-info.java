/**
 * The suspension geometry tables of the {@code geometry} command (and any screen that shows them): roll-centre
 * height and offset, cambers and track against body roll, camber and instant centre against wheel travel; as
 * text in the chosen units and as JSON ({@code barwright.geometry}, version 1).
 */
package barwright.report.linkage;
