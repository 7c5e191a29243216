/** Output of the roll dynamics (model.md 12): the {@code transient} command's JSON, text and CSV. */
package barwright.report.dynamics;
