package barwright.report.work;

import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.work.KeyFigure.Kind;
import barwright.units.UnitSystem;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import java.nio.file.Path;
import java.util.HashMap;
import java.util.Locale;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * The show-the-work text as a reader checks it with a calculator: each derivation printed in SI and in US
 * customary units, its lines read back as "symbol = number unit", the unit of each figure the one its quantity
 * is shown in, and the result re-worked from the numbers as printed, with only the unit factors a reader
 * supplies (mm to m, in to ft, g = 9.80665 m/s², a pound of mass weighing a pound-force at 1 g, π/180 from
 * radians to degrees). Tolerance 0.3 %: each printed number carries four significant digits (up to 0.05 %
 * off), and a product of up to five of them.
 */
class WorkUnitsTest {
    private static final double ROUNDING_PERCENT = 0.3;
    private static final double G = 9.80665;
    private static final double PER_DEGREE = Math.PI / 180;
    private static AnalysisResult result;

    @BeforeAll
    static void analyse() throws Exception {
        result = VehicleAnalysis.analyse(VehicleLoader.read(Path.of("sample-vehicles", "club-hatchback.json"))
                .vehicle());
    }

    /** A printed figure: its number and its unit as written. */
    private record Shown(double number, String unit) {
    }

    private static final Pattern LINE = Pattern.compile("^ {4}(\\S.*?) += (-?[0-9.]+)(?: (\\S+))?(?: {2,}| \\S|$)");

    /** @return every "symbol = number unit" line of the derivation's text, by symbol (a later line wins) */
    private static Map<String, Shown> read(KeyFigure figure, UnitSystem units) {
        String text = WorkText.of(Derivations.of(result, figure), units, Locale.ROOT);
        Map<String, Shown> shown = new HashMap<>();
        for (String line : text.split("\n")) {
            Matcher match = LINE.matcher(line);
            if (match.find()) {
                // the unit column: a token right after the number; the meaning follows after two spaces or more
                String rest = line.substring(match.end(2));
                String unit = rest.startsWith(" ") && !rest.startsWith("  ") ? rest.substring(1).split(" ")[0] : "";
                shown.put(match.group(1).trim(), new Shown(Double.parseDouble(match.group(2)), unit));
            }
        }
        return shown;
    }

    private static boolean si(UnitSystem units) {
        return units == UnitSystem.SI;
    }

    /** @return a length as printed, in m (SI, from mm) or ft (US, from in) */
    private static double metresOrFeet(Shown length, UnitSystem units) {
        assertThat(length.unit()).isEqualTo(si(units) ? "mm" : "in");
        return length.number() / (si(units) ? 1000 : 12);
    }

    /** @return a rate as printed, in N/m (SI, from N/mm) or lbf/ft (US, from lbf/in) */
    private static double perMetreOrFoot(Shown rate, UnitSystem units) {
        assertThat(rate.unit()).isEqualTo(si(units) ? "N/mm" : "lbf/in");
        return rate.number() * (si(units) ? 1000 : 12);
    }

    /** @return the weight of a printed mass at 1 g: N (SI, kg × g) or lbf (US, a pound weighs a pound-force) */
    private static double weight(Shown mass, UnitSystem units) {
        assertThat(mass.unit()).isEqualTo(si(units) ? "kg" : "lb");
        return mass.number() * (si(units) ? G : 1);
    }

    private static String stiffnessUnit(UnitSystem units) {
        return si(units) ? "N·m/deg" : "lbf·ft/deg";
    }

    private static String forceUnit(UnitSystem units) {
        return si(units) ? "N" : "lbf";
    }

    private static void near(Shown printed, double reworked, String unit) {
        assertThat(printed.unit()).isEqualTo(unit);
        assertThat(printed.number()).isCloseTo(reworked, withinPercentage(ROUNDING_PERCENT));
    }

    @ParameterizedTest
    @EnumSource(UnitSystem.class)
    void theLoadTransferPartsArePerGAndAreTheProductsOfTheirFactors(UnitSystem units) {
        Map<String, Shown> work = read(KeyFigure.of(Kind.FRONT_LOAD_TRANSFER_SHARE), units);
        String perG = si(units) ? "N/g" : "lbf/g";
        // the formulas name the g that turns a mass into a force per g (kg·m/m alone would be a mass)
        assertThat(WorkText.of(Derivations.of(result, KeyFigure.of(Kind.FRONT_LOAD_TRANSFER_SHARE)), units,
                Locale.ROOT)).contains("ΔF_uf = m_uf g h_uf / t_f", "ΔF_gr = m_sr g z_r / t_r");
        for (String s : new String[]{"f", "r"}) {
            double track = metresOrFeet(work.get("t_" + s), units);
            near(work.get("ΔF_u" + s), weight(work.get("m_u" + s), units)
                    * metresOrFeet(work.get("h_u" + s), units) / track, perG);
            near(work.get("ΔF_g" + s), weight(work.get("m_s" + s), units)
                    * metresOrFeet(work.get("z_" + s), units) / track, perG);
            assertThat(work.get("φ_" + s + "/a_y").unit()).isEqualTo("deg/g");
            assertThat(work.get("K_" + s).unit()).isEqualTo(stiffnessUnit(units));
            near(work.get("ΔF_e" + s), work.get("K_" + s).number() * work.get("φ_" + s + "/a_y").number() / track,
                    perG);
            near(work.get("ΔF_" + s), work.get("ΔF_u" + s).number() + work.get("ΔF_g" + s).number()
                    + work.get("ΔF_e" + s).number(), perG);
        }
        near(work.get("share"), 100 * work.get("ΔF_f").number()
                / (work.get("ΔF_f").number() + work.get("ΔF_r").number()), "%");
    }

    @ParameterizedTest
    @EnumSource(UnitSystem.class)
    void eachRollStiffnessIsPerDegreeFromItsRatesAndTrack(UnitSystem units) {
        for (AxlePosition axle : AxlePosition.values()) {
            Map<String, Shown> springs = read(KeyFigure.of(Kind.SPRING_ROLL_STIFFNESS, axle), units);
            near(springs.get("k_w"), springs.get("k_s").number() * Math.pow(springs.get("MR").number(), 2),
                    si(units) ? "N/mm" : "lbf/in");
            double track = metresOrFeet(springs.get("t"), units);
            near(springs.get("K_spr"), perMetreOrFoot(springs.get("k_w"), units) * track * track / 2 * PER_DEGREE,
                    stiffnessUnit(units));
            Map<String, Shown> bar = read(KeyFigure.of(Kind.BAR_ROLL_STIFFNESS, axle), units);
            near(bar.get("K_bar"), perMetreOrFoot(bar.get("k_link"), units) * Math.pow(bar.get("r").number(), 2)
                    * track * track * PER_DEGREE, stiffnessUnit(units));
            Map<String, Shown> tyres = read(KeyFigure.of(Kind.TYRE_ROLL_STIFFNESS, axle), units);
            near(tyres.get("K_tyre"), perMetreOrFoot(tyres.get("k_t"), units) * track * track / 2 * PER_DEGREE,
                    stiffnessUnit(units));
            Map<String, Shown> whole = read(KeyFigure.of(Kind.AXLE_ROLL_STIFFNESS, axle), units);
            double suspension = whole.get("K_spr").number() + whole.get("K_bar").number();
            near(whole.get("K_susp"), suspension, stiffnessUnit(units));
            near(whole.get("K"), 1 / (1 / suspension + 1 / whole.get("K_tyre").number()), stiffnessUnit(units));
        }
    }

    @ParameterizedTest
    @EnumSource(UnitSystem.class)
    void theRollGradientIsDegreesPerGFromTheRollMomentOfOneG(UnitSystem units) {
        Map<String, Shown> work = read(KeyFigure.of(Kind.ROLL_GRADIENT), units);
        // 1 g of cornering: a roll moment m_s g h' (N·m or lbf·ft) over the net stiffness per degree
        double moment = weight(work.get("m_s"), units) * metresOrFeet(work.get("h'"), units);
        near(work.get("m_s g h'"), moment * PER_DEGREE, stiffnessUnit(units));
        double net = work.get("K_f").number() + work.get("K_r").number() - work.get("m_s g h'").number();
        near(work.get("φ/a_y"), moment / net, "deg/g");
    }

    @ParameterizedTest
    @EnumSource(UnitSystem.class)
    void theBalanceFiguresCarryTheirUnits(UnitSystem units) {
        Map<String, Shown> weight = read(KeyFigure.of(Kind.STATIC_FRONT_WEIGHT), units);
        near(weight.get("W_f"), weight.get("W_lf").number() + weight.get("W_rf").number(), forceUnit(units));
        near(weight.get("share"), 100 * weight.get("W_f").number()
                / (weight.get("W_f").number() + weight.get("W_r").number()), "%");
        Map<String, Shown> understeer = read(KeyFigure.of(Kind.UNDERSTEER_GRADIENT), units);
        assertThat(understeer.get("C_f").unit()).isEqualTo(si(units) ? "N/deg" : "lbf/deg");
        near(understeer.get("α_f"), understeer.get("W_f").number() / understeer.get("C_f").number(), "deg");
        near(understeer.get("K_us"), understeer.get("α_f").number() - understeer.get("α_r").number(), "deg/g");
    }

    @ParameterizedTest
    @EnumSource(UnitSystem.class)
    void theLimitAndTheLiftAreInGFromForcesAndMasses(UnitSystem units) {
        for (TurnDirection turn : TurnDirection.values()) {
            Map<String, Shown> limit = read(KeyFigure.of(Kind.LIMIT, turn), units);
            assertThat(limit.get("F_zo").unit()).isEqualTo(forceUnit(units));
            near(limit.get("a_y"), limit.get("capacity").number()
                    / (limit.get("share").number() / 100 * weight(limit.get("m"), units)), "g");
            Map<String, Shown> balance = read(KeyFigure.of(Kind.BALANCE, turn), units);
            // a difference of two close numbers: each printed to 0.001 g, so the difference to 0.001 g
            assertThat(balance.get("a_r − a_f").unit()).isEqualTo("g");
            assertThat(balance.get("a_r − a_f").number()).isCloseTo(balance.get("a_r").number()
                    - balance.get("a_f").number(), org.assertj.core.api.Assertions.within(0.001));
            Map<String, Shown> lift = read(KeyFigure.of(Kind.INSIDE_LIFT, AxlePosition.REAR, turn), units);
            assertThat(lift.get("ΔF/a_y").unit()).isEqualTo(si(units) ? "N/g" : "lbf/g");
            near(lift.get("a_lift"), lift.get("W_i").number() / lift.get("ΔF/a_y").number(), "g");
        }
    }

    @ParameterizedTest
    @EnumSource(UnitSystem.class)
    void theBarsMassStressAndBushingLoadComeOutInTheirUnits(UnitSystem units) {
        for (AxlePosition axle : AxlePosition.values()) {
            Map<String, Shown> mass = read(KeyFigure.of(Kind.BAR_MASS, axle), units);
            // kg/m³ × mm² × mm, or lb/in³ × in² × in
            double area = mass.get("A").number() * (si(units) ? 1e-6 : 1);
            double length = (mass.get("L").number() + 2 * mass.get("a_max").number()) * (si(units) ? 1e-3 : 1);
            assertThat(mass.get("A").unit()).isEqualTo(si(units) ? "mm²" : "in²");
            near(mass.get("m_bar"), mass.get("ρ").number() * area * length, si(units) ? "kg" : "lb");
            Map<String, Shown> safety = read(KeyFigure.of(Kind.BAR_SAFETY_FACTOR, axle), units);
            near(safety.get("Δ"), safety.get("r").number() * safety.get("travel").number(), si(units) ? "mm" : "in");
            near(safety.get("F"), safety.get("k_link").number() * safety.get("Δ").number(), forceUnit(units));
            // N·mm·mm / mm⁴ = MPa; lbf·in·in / in⁴ = psi, / 1000 = ksi
            Map<String, Shown> rate = read(KeyFigure.of(Kind.BAR_LINK_RATE, axle), units);
            near(safety.get("τ"), safety.get("F").number() * safety.get("a").number() * safety.get("R").number()
                    / rate.get("J").number() / (si(units) ? 1 : 1000), si(units) ? "MPa" : "ksi");
            near(safety.get("SF"), safety.get("σ_y").number() / safety.get("σ_max").number(), "");
            Map<String, Shown> bushing = read(KeyFigure.of(Kind.BAR_BUSHING_LOAD, axle), units);
            near(bushing.get("R"), bushing.get("F").number() * bushing.get("L").number() / bushing.get("s").number(),
                    forceUnit(units));
        }
    }
}
