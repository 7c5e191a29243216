/**
 * Tables of measurements in CSV files (file-format.md, "CSV files"): a header row naming the columns, numeric
 * columns required or optional, every problem named by its line and column. General, for any measured data
 * the program reads (tyre tests today).
 */
package barwright.io.csv;
