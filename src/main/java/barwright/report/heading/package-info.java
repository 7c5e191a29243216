/**
 * What every output starts with: the {@code format} and {@code version} head of each JSON document, and the first
 * line of each text. A leaf package, so that {@code report} and its sub-packages can all use it without a cycle.
 */
package barwright.report.heading;
