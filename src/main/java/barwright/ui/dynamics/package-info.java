/**
 * The roll in motion in the window (model.md 14): each axle's damper curve (editable), the turn-in view (a step
 * of lateral acceleration, its figures and the car from behind playing it back) and the lap view (a logged lap
 * replayed with progress and a cursor). The runs come from {@code physics.dynamics} through
 * {@code ui.task.BackgroundWork}, off the event thread; charts are drawn by {@code ui.chart}.
 */
package barwright.ui.dynamics;
