/** Output of the roll dynamics (model.md 14): the {@code transient} command's JSON, text and CSV. */
package barwright.report.dynamics;
