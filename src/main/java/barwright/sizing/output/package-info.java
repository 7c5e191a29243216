/** The sizing, map, comparison and preload results as JSON and CSV for scripts; units in the key names. */
package barwright.sizing.output;
