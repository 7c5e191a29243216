/**
 * Loading a car: the one way the program turns a vehicle file (a path, bytes, or the open document's tree) into
 * a checked car. {@code io} reads and validates the file; the checks that need the calculation (a shaped bar
 * built into the beam model, a linkage put together and moved) come from {@code physics} and are worded here
 * with the file's key paths. So {@code io} computes nothing and {@code physics} knows no key names.
 */
package barwright.loading;
