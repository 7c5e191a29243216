package barwright.units;

/**
 * A unit a person reads or types, with how many SI base units one of it is.
 *
 * @param symbol    what is printed after the number, e.g. "N/mm"
 * @param siPerUnit the size of one of this unit in the SI base unit of its quantity
 */
public record DisplayUnit(String symbol, double siPerUnit) {
    public DisplayUnit {
        if (!(siPerUnit > 0) || Double.isInfinite(siPerUnit)) {
            throw new IllegalArgumentException("unit " + symbol + ": factor must be positive, was " + siPerUnit);
        }
    }

    /** @return the SI value expressed in this unit */
    public double fromSi(double si) {
        return si / siPerUnit;
    }

    /** @return the value in this unit expressed in SI */
    public double toSi(double value) {
        return value * siPerUnit;
    }
}
