/** Output of the workshop measurements (model.md 12): JSON for scripts and readable text through units. */
package barwright.report.measure;
