/**
 * The sizing, tube, map, comparison and preload results ({@code barwright.sizing}) as text for people and
 * JSON and CSV for scripts; units in the key names. No Swing here.
 */
package barwright.report.sizing;
