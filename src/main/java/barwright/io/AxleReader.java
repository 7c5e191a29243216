package barwright.io;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.SuspensionGeometry;
import barwright.model.Tyre;
import com.fasterxml.jackson.databind.JsonNode;

/** Reads the {@code front} or {@code rear} object of a vehicle file. */
final class AxleReader {
    private AxleReader() {
    }

    static Axle read(JsonNode node, String path, NodeReader reader, int version) {
        int before = reader.problems().size();
        double track = reader.number(node, path, "trackMm", Range.between(300, 4000, "mm")) * 1e-3;
        double rollCentre = reader.number(node, path, VehicleKeys.ROLL_CENTRE_HEIGHT_MM,
                Range.between(-500, 1500, "mm")) * 1e-3;
        double unsprungMass = reader.number(node, path, "unsprungMassKg", Range.between(0, 2000, "kg"));
        double unsprungHeight = reader.number(node, path, "unsprungCgHeightMm", Range.between(0, 2000, "mm")) * 1e-3;
        double springRate = reader.number(node, path, "springRateNPerMm", Range.between(0.5, 2000, "N/mm")) * 1e3;
        double springRatio = reader.number(node, path, "springMotionRatio", Range.between(0.1, 3, ""));
        double tyreRate = reader.number(node, path, "tyreVerticalRateNPerMm", Range.between(10, 10000, "N/mm")) * 1e3;
        JsonNode tyreNode = reader.object(node, path, VehicleKeys.TYRE, true);
        Tyre tyre = tyreNode == null ? null : VehicleFileReader.readTyre(tyreNode, path + ".tyre", reader);
        JsonNode barNode = reader.object(node, path, "bar", false);
        if (!node.has("bar")) {
            reader.problem(NodeReader.child(path, "bar"), "is missing: give the bar object, or null for no bar");
        }
        AntiRollBar bar = barNode == null ? null : BarReader.read(barNode, path + ".bar", reader);
        if (reader.problems().size() > before || tyre == null) {
            return null;
        }
        Axle axle = new Axle(track, rollCentre, unsprungMass, unsprungHeight, springRate, springRatio, tyreRate, tyre, bar);
        SuspensionGeometry suspension = LinkageReader.read(node, path, reader, version, axle);
        return suspension == null ? null : axle.withSuspension(suspension);
    }
}
