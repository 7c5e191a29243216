package barwright.solver;

import org.junit.jupiter.api.Test;

import java.util.concurrent.atomic.AtomicInteger;
import java.util.function.DoubleUnaryOperator;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

/**
 * The root-finding wrapper against roots known in closed form (each reference is a java.lang.Math value of
 * the closed form, computed independently of the solver), and its failure modes.
 */
class RootFinderTest {
    private static final double ACCURACY = 1e-12;
    private static final RootFinder FINDER = RootFinder.of("a test root", ACCURACY, 100);

    @Test
    void findsRootsKnownInClosedForm() {
        // x^2 - 2 = 0: sqrt 2; e^x - 3 = 0: ln 3; x^3 - 10 = 0: cube root of 10; sin x = 0 near 3: pi.
        // Brent stops once the bracket is narrower than about twice the accuracy asked, hence 2 x accuracy.
        assertEquals(Math.sqrt(2), FINDER.solve(x -> x * x - 2, 0, 2), 2 * ACCURACY);
        assertEquals(Math.log(3), FINDER.solve(x -> Math.exp(x) - 3, -5, 5), 2 * ACCURACY);
        assertEquals(Math.cbrt(10), FINDER.solve(x -> x * x * x - 10, 1, 4), 2 * ACCURACY);
        assertEquals(Math.PI, FINDER.solve(Math::sin, 3, 4), 2 * ACCURACY);
    }

    @Test
    void aLooseAccuracyIsHonouredAndSavesEvaluations() {
        AtomicInteger tight = new AtomicInteger();
        AtomicInteger loose = new AtomicInteger();
        DoubleUnaryOperator cubic = x -> x * x * x - 10;
        RootFinder.of("tight", 1e-12, 100).solve(counted(cubic, tight), 1, 4);
        double coarse = RootFinder.of("loose", 1e-3, 100).solve(counted(cubic, loose), 1, 4);
        assertEquals(Math.cbrt(10), coarse, 2e-3);
        assertTrue(loose.get() < tight.get(), loose + " evaluations for 1e-3, " + tight + " for 1e-12");
    }

    @Test
    void anEndThatIsARootIsReturned() {
        assertEquals(2.0, FINDER.solve(x -> x - 2, 2, 3), 0);
    }

    @Test
    void noSignChangeIsRefusedWithWhatWasSought() {
        RootNotFoundException failure = assertThrows(RootNotFoundException.class,
                () -> FINDER.solve(x -> x * x + 1, -1, 2));
        assertEquals(RootNotFoundException.Reason.NO_BRACKET, failure.reason());
        assertTrue(failure.getMessage().startsWith("Could not solve for a test root: it does not change sign"),
                failure.getMessage());
    }

    @Test
    void aValueThatIsNotFiniteIsRefused() {
        RootNotFoundException failure = assertThrows(RootNotFoundException.class,
                () -> FINDER.solve(x -> Math.sqrt(x - 1) - 0.5, 0, 2));
        assertEquals(RootNotFoundException.Reason.NOT_FINITE, failure.reason());
    }

    @Test
    void anExhaustedBudgetIsRefusedNotAnInternalFailure() {
        AtomicInteger calls = new AtomicInteger();
        RootFinder stingy = RootFinder.of("a stingy root", 1e-15, 4);
        RootNotFoundException failure = assertThrows(RootNotFoundException.class,
                () -> stingy.solve(counted(x -> Math.exp(x) - 3, calls), -50, 50));
        assertEquals(RootNotFoundException.Reason.BUDGET_SPENT, failure.reason());
        assertTrue(calls.get() <= 4, calls + " evaluations on a budget of 4");
        assertTrue(failure.getMessage().contains("a stingy root"), failure.getMessage());
    }

    @Test
    void aBracketThatIsNoIntervalIsRefused() {
        assertEquals(RootNotFoundException.Reason.NO_BRACKET, assertThrows(RootNotFoundException.class,
                () -> FINDER.solve(x -> x, 1, -1)).reason());
        assertEquals(RootNotFoundException.Reason.NO_BRACKET, assertThrows(RootNotFoundException.class,
                () -> FINDER.solve(x -> x, Double.NaN, 1)).reason());
    }

    @Test
    void meaninglessSettingsAreRefused() {
        assertThrows(IllegalArgumentException.class, () -> RootFinder.of("x", 0, 100));
        assertThrows(IllegalArgumentException.class, () -> RootFinder.of("x", 1e-9, 1));
        assertThrows(IllegalArgumentException.class, () -> RootFinder.of(" ", 1e-9, 100));
    }

    private static DoubleUnaryOperator counted(DoubleUnaryOperator function, AtomicInteger calls) {
        return x -> {
            calls.incrementAndGet();
            return function.applyAsDouble(x);
        };
    }
}
