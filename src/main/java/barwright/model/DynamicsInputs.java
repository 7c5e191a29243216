package barwright.model;

/**
 * What only the roll dynamics needs beyond the {@link Vehicle}: the body's roll inertia and the dampers.
 * Kept beside the vehicle, read from the same file (file-format.md, "Roll dynamics").
 *
 * @param rollInertia the sprung mass's roll moment of inertia about its own centre of mass I_xx (kg m^2), or
 *                    null where the file gives none
 * @param frontDamper the front dampers, or null for none
 * @param rearDamper  the rear dampers, or null for none
 */
public record DynamicsInputs(Double rollInertia, Damper frontDamper, Damper rearDamper) {
    public DynamicsInputs {
        if (rollInertia != null) {
            Checks.positive("rollInertia", rollInertia);
        }
    }

    public Damper damper(AxlePosition position) {
        return position == AxlePosition.FRONT ? frontDamper : rearDamper;
    }
}
