package barwright.physics.bar;

/** Which model produced a bar's rate and stresses. */
public enum BarModel {
    /** The plain U-bar of model.md 2 (Castigliano). */
    CLOSED_FORM("closed-form"),
    /** The 3-D beam-element frame for a bar of any shape. */
    BEAM("beam");

    private final String key;

    BarModel(String key) {
        this.key = key;
    }

    /** @return the value of the report key {@code barModel} */
    public String key() {
        return key;
    }
}
