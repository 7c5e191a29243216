/**
 * The window's views of issue 5: sizing a bar to a target, tube or solid of equal rate, the arm-hole map,
 * setups compared side by side, link preload, and the setup sheet and map exports. They open from the Tools
 * and File menus, whose commands {@link barwright.ui.sizing.SizingViews} contributes to the main window; long work
 * runs in {@link barwright.ui.task.BackgroundWork}, off the event thread, with progress and cancel. Event thread
 * otherwise.
 */
package barwright.ui.sizing;
