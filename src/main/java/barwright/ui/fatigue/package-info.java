/**
 * The bar's fatigue life in the window (docs/model.md 13): {@link barwright.ui.fatigue.BarLifeView} on each bar
 * page, computed off the event thread.
 */
package barwright.ui.fatigue;
