/**
 * The three setter's questions in the window: where an inside wheel lifts ({@link barwright.ui.insight.EnvelopeView}),
 * what moves the balance most ({@link barwright.ui.insight.SensitivityView}) and what a flexible chassis costs
 * ({@link barwright.ui.insight.ChassisView}), computed by barwright.insight off the event thread after every
 * accepted edit.
 */
package barwright.ui.insight;
