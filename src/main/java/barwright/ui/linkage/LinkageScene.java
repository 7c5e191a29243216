package barwright.ui.linkage;

import barwright.io.LinkageKeys;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.linkage.FrontViewFigure;
import barwright.physics.linkage.LinkageLimitException;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.Locale;
import java.util.concurrent.atomic.AtomicReference;

/**
 * What the front-view drawing shows: one axle's linkage at the body roll of the slider's lateral acceleration,
 * or why it shows none. Solved off the event thread ({@link #solve}); the figure of an axle is kept between
 * requests, so a slider move costs one roll solve and an edit one rebuild.
 *
 * @param revision      which request this answers (higher is newer)
 * @param axle          the axle shown
 * @param type          the linkage's type as the file writes it ("" with no linkage)
 * @param figure        the linkage at the roll, or null
 * @param acceleration  the lateral acceleration drawn (m/s^2), 0 without an analysis
 * @param turn          the turn direction
 * @param roll          the body roll drawn (rad), positive for a left turn
 * @param typedRollCentreHeight the typed roll-centre height (m) of an axle without a linkage
 * @param note          what a person should know about the picture (a refusal, a linkage run out of travel), or
 *                      null
 */
record LinkageScene(long revision, AxlePosition axle, String type, FrontViewFigure.Figure figure,
                    double acceleration, TurnDirection turn, double roll, double typedRollCentreHeight,
                    String note) {

    /**
     * What is asked.
     *
     * @param revision  increases with each request
     * @param axle      which axle
     * @param tree      a vehicle file tree to read first (a dragged point's preview), or null to use {@code vehicle}
     * @param vehicle   the car as last accepted
     * @param result    the analysis on screen (the body roll comes from it), or null
     * @param turn      the slider's turn
     * @param fraction  the slider's share of the grip limit
     */
    record Request(long revision, AxlePosition axle, JsonNode tree, VehicleDocument vehicle, AnalysisResult result,
                   TurnDirection turn, double fraction) {
    }

    /** The last axle's figure, reused while only the roll changes (read and written by the one worker at a time). */
    private static final AtomicReference<Cached> CACHE = new AtomicReference<>();

    private record Cached(Axle axle, FrontViewFigure figure) {
    }

    boolean hasLinkage() {
        return !type.isEmpty();
    }

    /** The work, off the event thread. */
    static LinkageScene solve(Request request) {
        VehicleDocument document = request.vehicle();
        String refusal = null;
        if (request.tree() != null) {
            try {
                document = VehicleLoader.fromTree(request.tree());
            } catch (VehicleFileException refused) {
                refusal = "Not there: " + refused.problems().get(0) + ".";
            }
        }
        Vehicle vehicle = document.vehicle();
        Axle axle = vehicle.axle(request.axle());
        String type = LinkageKeys.type(document.tree().path(request.axle().key()).get(LinkageKeys.linkage()));
        double accel = 0;
        double roll = 0;
        AnalysisResult result = request.result();
        if (result != null) {
            accel = result.turn(request.turn()).limit() * request.fraction();
            roll = endRoll(result, request.axle(), request.turn(), accel);
        }
        if (!axle.hasLinkage()) {
            return new LinkageScene(request.revision(), request.axle(), "", null, accel, request.turn(), roll,
                    axle.rollCentreHeight(), refusal);
        }
        FrontViewFigure figure;
        try {
            figure = figure(axle);
        } catch (LinkageLimitException cannot) {
            return new LinkageScene(request.revision(), request.axle(), type, null, accel, request.turn(), roll, 0,
                    "The linkage cannot be put together at its ride height: " + cannot.getMessage() + ".");
        }
        if (!Double.isFinite(roll)) {
            return new LinkageScene(request.revision(), request.axle(), type, figure.at(0), accel, request.turn(), 0, 0,
                    join(refusal, "The body has no steady roll here (it rolls over): drawn at rest."));
        }
        try {
            return new LinkageScene(request.revision(), request.axle(), type, figure.at(roll), accel, request.turn(),
                    roll, 0, refusal);
        } catch (LinkageLimitException beyond) {
            return new LinkageScene(request.revision(), request.axle(), type, figure.at(0), accel, request.turn(), 0, 0,
                    join(refusal, String.format(Locale.ROOT, "At %.1f deg of body roll the linkage cannot follow (%s): "
                            + "drawn at rest.", Math.toDegrees(Math.abs(roll)), beyond.getMessage())));
        }
    }

    /**
     * The roll of the axle's end of the body: the analysis's body roll at the acceleration, scaled by the end's
     * share where the chassis twists (equal ends for a rigid chassis).
     */
    private static double endRoll(AnalysisResult result, AxlePosition axle, TurnDirection turn, double accel) {
        double roll = result.turn(turn).cornering().rollAngle(accel);
        double mean = result.roll().rollPerAccel();
        double end = axle == AxlePosition.FRONT ? result.roll().frontRollPerAccel() : result.roll().rearRollPerAccel();
        if (mean > 0 && Double.isFinite(end)) {
            roll *= end / mean;
        }
        return turn == TurnDirection.LEFT ? roll : -roll;
    }

    private static FrontViewFigure figure(Axle axle) {
        Cached cached = CACHE.get();
        if (cached != null && cached.axle().equals(axle)) {
            return cached.figure();
        }
        FrontViewFigure made = FrontViewFigure.of(axle);
        CACHE.set(new Cached(axle, made));
        return made;
    }

    private static String join(String first, String second) {
        return first == null ? second : first + " " + second;
    }
}
