/**
 * The inputs of an analysis, as immutable records in SI base units (m, kg, N, Pa, rad).
 *
 * <p>Axes of the car: x forward, y to the left, z up. Validation of a vehicle file with key paths and
 * allowed ranges lives in {@code barwright.io}; the records here only refuse values that would make the
 * physics meaningless (a programming error, not a user error).
 */
package barwright.model;
