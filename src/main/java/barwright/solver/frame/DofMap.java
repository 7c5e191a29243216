package barwright.solver.frame;

import java.util.ArrayList;
import java.util.List;

/**
 * Which freedoms of a frame are unknowns of the equations, and in which axes. Each node has two "slots",
 * its translation and its rotation (slot = 2 node + kind). A slot with rigid constraints gets its own axes
 * (the constrained directions first, then the free ones) and its constrained components are removed; the
 * others keep the global axes. Equations are numbered node by node, so a chain stays banded.
 */
final class DofMap {
    /** Rigid directions closer than this (sine) to the ones already taken add no constraint. */
    private static final double DEPENDENT_SINE = 1e-9;

    private final double[][] slotAxes;
    private final int[] equations;
    private final int[] slotOfEquation;
    private final int equationCount;

    private DofMap(double[][] slotAxes, int[] equations, int equationCount) {
        this.slotAxes = slotAxes;
        this.equations = equations;
        this.equationCount = equationCount;
        this.slotOfEquation = new int[equationCount];
        for (int index = 0; index < equations.length; index++) {
            if (equations[index] >= 0) {
                slotOfEquation[equations[index]] = index / 3;
            }
        }
    }

    /** Every freedom an unknown, in global axes: equation 6 node + component (ux, uy, uz, rx, ry, rz). */
    static DofMap unconstrained(int nodeCount) {
        int slots = 2 * nodeCount;
        double[][] axes = new double[slots][];
        int[] equations = new int[3 * slots];
        for (int index = 0; index < equations.length; index++) {
            equations[index] = index;
        }
        return new DofMap(axes, equations, equations.length);
    }

    /** The unknowns left once the model's rigid constraints are applied. */
    static DofMap of(FrameModel model) {
        int slots = 2 * model.nodes().size();
        List<List<Vector3>> rigid = new ArrayList<>();
        for (int slot = 0; slot < slots; slot++) {
            rigid.add(new ArrayList<>());
        }
        for (Support support : model.supports()) {
            if (support.isRigid()) {
                rigid.get(slot(support.node(), support.kind())).add(support.direction());
            }
        }
        double[][] axes = new double[slots][];
        int[] equations = new int[3 * slots];
        int next = 0;
        for (int slot = 0; slot < slots; slot++) {
            List<Vector3> basis = orthonormalBasis(rigid.get(slot));
            axes[slot] = basis.isEmpty() ? null : completed(basis);
            for (int component = 0; component < 3; component++) {
                equations[3 * slot + component] = component < basis.size() ? -1 : next++;
            }
        }
        return new DofMap(axes, equations, next);
    }

    static int slot(int node, DofKind kind) {
        return 2 * node + kind.ordinal();
    }

    int equationCount() {
        return equationCount;
    }

    /** @return the equation of a slot's component in the slot's axes, or -1 where it is held rigidly */
    int equation(int slot, int component) {
        return equations[3 * slot + component];
    }

    /** @return the slot's axes (rows, flat row-major), or null where they are the global axes */
    double[] axes(int slot) {
        return slotAxes[slot];
    }

    /** @return the node an equation belongs to */
    int nodeOf(int equation) {
        return slotOfEquation[equation] / 2;
    }

    /** @return the kind of freedom an equation belongs to */
    DofKind kindOf(int equation) {
        return DofKind.values()[slotOfEquation[equation] % 2];
    }

    /** @return a global 3-vector written in the slot's axes */
    double[] toSlotAxes(int slot, Vector3 global) {
        double[] components = {global.x(), global.y(), global.z()};
        double[] axes = slotAxes[slot];
        if (axes == null) {
            return components;
        }
        double[] local = new double[3];
        Rotations.applyTo(axes, components, 0, local, 0);
        return local;
    }

    /** Writes the slot's three global components, from its components in its own axes. */
    void toGlobal(int slot, double[] slotComponents, double[] out, int outOffset) {
        double[] axes = slotAxes[slot];
        if (axes == null) {
            System.arraycopy(slotComponents, 0, out, outOffset, 3);
        } else {
            Rotations.applyTransposeTo(axes, slotComponents, 0, out, outOffset);
        }
    }

    private static List<Vector3> orthonormalBasis(List<Vector3> directions) {
        List<Vector3> basis = new ArrayList<>();
        for (Vector3 direction : directions) {
            Vector3 rest = direction;
            for (Vector3 taken : basis) {
                rest = rest.minus(taken.times(rest.dot(taken)));
            }
            if (rest.length() > DEPENDENT_SINE) {
                basis.add(rest.unit());
            }
        }
        return basis;
    }

    /** @return three orthonormal rows (flat row-major) beginning with the given one, two or three */
    private static double[] completed(List<Vector3> basis) {
        Vector3 first = basis.get(0);
        Vector3 second = basis.size() > 1 ? basis.get(1) : first.perpendicular();
        Vector3 third = first.cross(second);
        return new double[] {first.x(), first.y(), first.z(), second.x(), second.y(), second.z(),
                third.x(), third.y(), third.z()};
    }
}
