package barwright.physics.fatigue;

import barwright.model.SurfaceFinish;

import barwright.model.FatigueStrength;

/**
 * The S-N line of a bar in Basquin's form S_f = a N^b through (10^3, f S_ut) and (N_e, S_e), with S_e the
 * Marin-modified endurance limit S_e = k_a k_b S'_e (Shigley's Mechanical Engineering Design, fatigue chapter:
 * the 10^3-cycle strength f S_ut, a = (f S_ut)^2 / S_e and b = -log(f S_ut / S_e) / 3 for N_e = 10^6, the Marin
 * equation, the size factor k_b = 1.24 d^-0.107 for 2.79 to 51 mm and 1.51 d^-0.157 for 51 to 254 mm, Eq. 6-20 of
 * the 9th ed.; the size factor and the worked example 6-2 of the line read on a web copy of the book,
 * docs/validation.md [R3]; f's fit from memory). The load factor k_c is 1 because the stresses are von Mises equivalents (same treatment); the
 * temperature and reliability factors are 1 (room temperature, 50 % reliability). A tube takes its outside
 * diameter for k_b (common practice). Below S_e the life is infinite.
 *
 * @param ultimateStrength S_ut (Pa)
 * @param enduranceLimit   S_e after the Marin factors (Pa)
 * @param kneeCycles       N_e
 * @param coefficient      Basquin's a (Pa)
 * @param exponent         Basquin's b (negative)
 */
public record SnCurve(double ultimateStrength, double enduranceLimit, double kneeCycles, double coefficient,
                      double exponent) {

    /** @return the S-N line of a bar of that outside diameter (m), material data and surface */
    public static SnCurve of(FatigueStrength strength, SurfaceFinish surface, double outerDiameter) {
        double ultimate = strength.ultimateStrength();
        double marin = surface.surfaceFactor(ultimate) * sizeFactor(outerDiameter);
        return through(ultimate, marin * strength.enduranceLimit(), strength.kneeCycles());
    }

    /**
     * @param ultimateStrength S_ut (Pa)
     * @param enduranceLimit   S_e with every Marin factor applied (Pa)
     * @param kneeCycles       N_e
     * @return the Basquin line through (10^3, f S_ut) and (N_e, S_e)
     */
    public static SnCurve through(double ultimateStrength, double enduranceLimit, double kneeCycles) {
        double thousandCycleStrength = thousandCycleFraction(ultimateStrength) * ultimateStrength;
        double exponent = -Math.log10(thousandCycleStrength / enduranceLimit) / Math.log10(kneeCycles / 1e3);
        double coefficient = thousandCycleStrength / Math.pow(1e3, exponent);
        return new SnCurve(ultimateStrength, enduranceLimit, kneeCycles, coefficient, exponent);
    }

    /** @return the fully reversed strength S_f = a N^b at that many cycles (Pa), N from 1 to N_e */
    public double strengthAt(double cycles) {
        return coefficient * Math.pow(cycles, exponent);
    }

    /**
     * Fatigue strength fraction f at 10^3 cycles: 0.9 up to S_ut = 70 kpsi, then Shigley's fit f = 1.06 -
     * 2.8e-3 S_ut + 6.9e-6 S_ut^2 (S_ut in kpsi, 70 to 200), held at its 200 kpsi value above (from memory).
     */
    static double thousandCycleFraction(double ultimateStrength) {
        double kpsi = Math.min(200, ultimateStrength / 6.894757e6);
        if (kpsi <= 70) {
            return 0.9;
        }
        return 1.06 - 2.8e-3 * kpsi + 6.9e-6 * kpsi * kpsi;
    }

    /** @return Marin's size factor k_b for a round bar in torsion and bending, d in m (1 below 2.79 mm) */
    static double sizeFactor(double diameter) {
        double mm = diameter * 1e3;
        if (mm <= 2.79) {
            return 1;
        }
        return mm <= 51 ? 1.24 * Math.pow(mm, -0.107) : 1.51 * Math.pow(Math.min(mm, 254), -0.157);
    }

    /**
     * @param fullyReversedAmplitude the equivalent fully reversed stress amplitude (Pa)
     * @return cycles to failure; +infinity below the endurance limit; at least 1 (a cycle past the 1-cycle
     * strength breaks the bar on that cycle)
     */
    public double cyclesToFailure(double fullyReversedAmplitude) {
        if (fullyReversedAmplitude < enduranceLimit) {
            return Double.POSITIVE_INFINITY;
        }
        double cycles = Math.pow(fullyReversedAmplitude / coefficient, 1 / exponent);
        return Math.max(1, cycles);
    }
}
