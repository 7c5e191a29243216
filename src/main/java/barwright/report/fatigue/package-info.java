/** The fatigue command's output: text through {@code units}, and the {@code barwright.fatigue} JSON. */
package barwright.report.fatigue;
