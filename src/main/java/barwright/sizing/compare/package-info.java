/** Two to four setups side by side: figures with their differences, and charts with one line per setup. */
package barwright.sizing.compare;
