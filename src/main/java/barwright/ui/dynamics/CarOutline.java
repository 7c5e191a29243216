package barwright.ui.dynamics;

import barwright.physics.AnalysisResult;

/**
 * What the car picture needs of an analysed car, in SI.
 *
 * @param track            the wider of the two tracks (m)
 * @param rollCentreHeight the rear roll centre's height, the point the body is drawn rolling about (m)
 * @param sprungCgHeight   the sprung mass's centre of mass height (m)
 * @param staticLoads      each wheel's load standing still: left front, right front, left rear, right rear (N)
 */
record CarOutline(double track, double rollCentreHeight, double sprungCgHeight, double[] staticLoads) {
    static CarOutline of(AnalysisResult result) {
        var statics = result.masses().staticLoads();
        return new CarOutline(Math.max(result.vehicle().front().track(), result.vehicle().rear().track()),
                result.vehicle().rear().rollCentreHeight(), result.masses().sprungCgHeight(),
                new double[] {statics.leftFront(), statics.rightFront(), statics.leftRear(), statics.rightRear()});
    }

    /** @return the largest static load, the scale of the load columns (N) */
    double largestStaticLoad() {
        double largest = 1;
        for (double load : staticLoads) {
            largest = Math.max(largest, load);
        }
        return largest;
    }
}
