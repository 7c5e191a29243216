/**
 * The lift envelope, sensitivity and chassis study ({@code barwright.insight}) as text for people and JSON for
 * scripts (docs/insight.md); units in the key names. No Swing here.
 */
package barwright.report.insight;
