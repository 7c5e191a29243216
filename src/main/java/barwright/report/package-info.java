/**
 * Plain data for people and scripts: the JSON report of files.md and the readable summary of an analysis, the
 * cautions; {@code report.insight} and {@code report.sizing} for the insight and sizing results,
 * {@code report.work} (show-the-work derivations), {@code report.sheet} (the PDF setup sheet). No Swing here.
 */
package barwright.report;
