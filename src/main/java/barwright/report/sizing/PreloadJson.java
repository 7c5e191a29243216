package barwright.report.sizing;

import barwright.report.heading.OutputDocument;
import barwright.sizing.preload.CornerLoads;
import barwright.sizing.preload.LinkPreload;
import barwright.sizing.preload.PreloadResult;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import static barwright.units.Conversions.perMillimetre;
import static barwright.units.Conversions.toDegrees;
import static barwright.units.Conversions.toMillimetres;


/** Link preload for scripts ({@code preload FILE --json}); lengths in mm, loads in N, as the keys say. */
public final class PreloadJson {
    public static final String FORMAT = "barwright.preload";
    public static final int VERSION = 1;

    private PreloadJson() {
    }

    public static ObjectNode of(PreloadResult result) {
        ObjectNode root = OutputDocument.start(FORMAT, VERSION);
        root.put("axle", result.axle().key());
        root.put("gainingDiagonal", result.diagonal().gains());
        root.put("linkChangeMm", toMillimetres(result.linkChange()));
        root.put("preloadAngleDegPerMm", toDegrees(perMillimetre(result.preloadAnglePerLength())));
        root.put("lockedMomentNmPerMm", perMillimetre(result.lockedMomentPerLength()));
        root.put("lockedMomentNm", result.lockedMoment());
        root.set("cornerLoadChangeNPerMm", corners(result.changePerLength().times(1e-3)));
        root.set("staticCornerLoadsN", corners(result.staticLoads()));
        root.set("cornerLoadsN", corners(result.loads()));
        root.put("crossWeightBefore", result.staticLoads().crossWeight());
        root.put("crossWeightAfter", result.loads().crossWeight());
        root.put("crossWeightChangePerMm", perMillimetre(result.crossWeightChangePerLength()));
        root.put("inWords", result.inWords());
        root.put("advice", LinkPreload.ADVICE);
        return root;
    }

    private static ObjectNode corners(CornerLoads loads) {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("leftFront", loads.leftFront());
        node.put("rightFront", loads.rightFront());
        node.put("leftRear", loads.leftRear());
        node.put("rightRear", loads.rightRear());
        return node;
    }
}
