package barwright.ui.dynamics;

import barwright.io.DynamicsInputReader;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.model.DynamicsInputs;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;

/**
 * An accepted vehicle document made ready for the roll dynamics: its steady analysis, its roll inertia and
 * dampers, and its outline for the picture. Built off the event thread.
 *
 * @param analysis the steady analysis (model.md 1-8)
 * @param inputs   the roll inertia and dampers (file-format.md, "Roll dynamics")
 * @param outline  what the car picture needs
 */
record DynamicsCar(AnalysisResult analysis, DynamicsInputs inputs, CarOutline outline) {
    /** @throws barwright.physics.ImpossibleVehicleException where the car has no stable roll position */
    static DynamicsCar of(VehicleDocument document) {
        AnalysisResult analysis = VehicleAnalysis.analyse(document.vehicle());
        DynamicsInputs inputs;
        try {
            inputs = DynamicsInputReader.read(document.tree());
        } catch (VehicleFileException refused) {
            // the document was accepted whole, dynamics keys included: a refusal here is a program fault
            throw new IllegalStateException("the accepted car's dynamics keys were refused: " + refused.getMessage(),
                    refused);
        }
        return new DynamicsCar(analysis, inputs, CarOutline.of(analysis));
    }

    /** @return words for a car with a missing damper, or null where both axles have one */
    String missingDampers() {
        boolean front = inputs.frontDamper() == null;
        boolean rear = inputs.rearDamper() == null;
        if (!front && !rear) {
            return null;
        }
        String which = front && rear ? "neither axle has" : (front ? "the front axle has" : "the rear axle has");
        return "Note: " + which + " a damper in the file, so the run has no damping there"
                + (front && rear ? ": the body keeps rocking at its natural frequency, which no real car does." : ".");
    }
}
