package barwright.physics.dynamics;

import barwright.model.Damper;
import org.apache.commons.math3.analysis.interpolation.LinearInterpolator;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

import java.util.List;
import java.util.TreeSet;

/**
 * An axle's roll damping moment against the roll rate of the body relative to the axle (model.md 14). The
 * two dampers work at the motion ratio MR, t/2 from the centre, one in bump and one in rebound:
 * {@code M(w) = (t/2) MR [F(MR w t/2) - F(-MR w t/2)]} (N m), with F the damper curve, piecewise linear and
 * held at its end slopes beyond its points. M is odd and strictly rising, so it has an inverse.
 */
public final class RollDamping {
    private final double[] rates;
    private final double[] moments;
    private final PolynomialSplineFunction moment;
    private final PolynomialSplineFunction rate;
    private final double slopeAtZero;

    /**
     * @param damper the axle's dampers
     * @param track  the track t (m)
     */
    public RollDamping(Damper damper, double track) {
        double arm = damper.motionRatio() * track / 2; // damper velocity per roll rate (m/rad)
        TreeSet<Double> breaks = new TreeSet<>();
        for (double velocity : damper.velocities()) {
            breaks.add(Math.abs(velocity) / arm);
            breaks.add(0.0 - Math.abs(velocity) / arm); // 0.0 - x: never -0.0, which the set keeps apart
        }
        rates = breaks.stream().mapToDouble(Double::doubleValue).toArray();
        moments = new double[rates.length];
        for (int i = 0; i < rates.length; i++) {
            double velocity = arm * rates[i];
            moments[i] = track / 2 * damper.motionRatio()
                    * (damperForce(damper, velocity) - damperForce(damper, -velocity));
        }
        LinearInterpolator interpolator = new LinearInterpolator();
        moment = interpolator.interpolate(rates, moments);
        rate = interpolator.interpolate(moments, rates);
        int zero = breaks.headSet(0.0).size();
        slopeAtZero = (moments[zero + 1] - moments[zero]) / (rates[zero + 1] - rates[zero]);
    }

    /** @return the damper force at a damper velocity (N), the curve held at its end slopes beyond its points */
    static double damperForce(Damper damper, double velocity) {
        List<Double> v = damper.velocities();
        List<Double> f = damper.forces();
        int last = v.size() - 1;
        int segment;
        if (velocity <= v.get(0)) {
            segment = 0;
        } else if (velocity >= v.get(last)) {
            segment = last - 1;
        } else {
            segment = 0;
            while (velocity > v.get(segment + 1)) {
                segment++;
            }
        }
        double slope = (f.get(segment + 1) - f.get(segment)) / (v.get(segment + 1) - v.get(segment));
        return f.get(segment) + slope * (velocity - v.get(segment));
    }

    /** @return the roll damping moment at a relative roll rate (N m, rate in rad/s) */
    public double moment(double rollRate) {
        return extended(moment, rates, moments, rollRate);
    }

    /** @return the relative roll rate at which the dampers carry a moment (rad/s) */
    public double rateFor(double rollMoment) {
        return extended(rate, moments, rates, rollMoment);
    }

    /** @return dM/dw at zero roll rate: the linearised roll damping coefficient (N m s/rad) */
    public double slopeAtZero() {
        return slopeAtZero;
    }

    private static double extended(PolynomialSplineFunction inside, double[] x, double[] y, double at) {
        int last = x.length - 1;
        if (at < x[0]) {
            return y[0] + (y[1] - y[0]) / (x[1] - x[0]) * (at - x[0]);
        }
        if (at > x[last]) {
            return y[last] + (y[last] - y[last - 1]) / (x[last] - x[last - 1]) * (at - x[last]);
        }
        return inside.value(at);
    }
}
