package barwright.report.work;

import barwright.units.Quantity;

/**
 * One number in a derivation: its symbol, what it is, its value in SI base units and its kind (which sets the
 * unit it is shown in).
 *
 * @param symbol   e.g. "k_s" or "K_f"
 * @param meaning  in words, e.g. "rate of one spring, at the spring"
 * @param value    SI base units (m, kg, N, N/m, N m/rad, rad per m/s^2, Pa, ...)
 * @param quantity what kind of figure it is
 */
public record WorkValue(String symbol, String meaning, double value, Quantity quantity) {
}
