/**
 * The window's linkage page: each axle's measured pickup points in a table and a front-view drawing of the linkage
 * with its construction (instant centres, roll centre, cambers), following the cornering slider; points edited in
 * the table or dragged on the drawing, each change one undoable edit through {@code io}.
 */
package barwright.ui.linkage;
