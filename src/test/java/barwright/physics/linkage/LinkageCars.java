package barwright.physics.linkage;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.FrontViewPoint;
import barwright.model.Linkage;
import barwright.model.SuspensionGeometry;
import barwright.model.Tyre;

/** Invented axles with linkages for the tests (not real cars): points in mm as a person would measure them. */
final class LinkageCars {
    static final Tyre TYRE = new Tyre(4000, 1.1, -0.1, 16, 2, 1.3, -0.5);

    private LinkageCars() {
    }

    static FrontViewPoint mm(double y, double z) {
        return new FrontViewPoint(y * 1e-3, z * 1e-3);
    }

    static Axle axle(double trackMm, Linkage linkage) {
        return axle(trackMm, linkage, 0, 0);
    }

    static Axle axle(double trackMm, Linkage linkage, double rideHeightChangeMm, double staticCamberDeg) {
        AntiRollBar noBar = null;
        return new Axle(trackMm * 1e-3, 0.05, 60, 0.3, 30e3, 1, 200e3, TYRE, noBar,
                new SuspensionGeometry(linkage, rideHeightChangeMm * 1e-3, Math.toRadians(staticCamberDeg)));
    }
}
