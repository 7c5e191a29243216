/**
 * Plain data for people and scripts, built from an analysis: the JSON report of files.md, the readable
 * summary of the command line. No Swing here.
 */
package barwright.report;
