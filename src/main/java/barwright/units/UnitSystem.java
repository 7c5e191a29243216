package barwright.units;

/** The two systems of units a person can choose to read and type figures in. */
public enum UnitSystem {
    SI("SI (metric)"),
    US("US customary");

    private final String label;

    UnitSystem(String label) {
        this.label = label;
    }

    public String label() {
        return label;
    }

    /** @return the system named "si" or "us" (any case) */
    public static UnitSystem parse(String name) {
        for (UnitSystem system : values()) {
            if (system.name().equalsIgnoreCase(name)) {
                return system;
            }
        }
        throw new IllegalArgumentException("unknown unit system '" + name + "': use si or us");
    }
}
