package barwright.solver.frame;

/**
 * The stiffness of one Euler-Bernoulli beam element, 6 freedoms per node (u_x', u_y', u_z', theta_x',
 * theta_y', theta_z' at the start, then the same at the end), in local axes and turned into global axes.
 *
 * <p>The local 12 x 12 matrix is the standard one of the direct stiffness method without shear deformation:
 * Przemieniecki, Theory of Matrix Structural Analysis (McGraw-Hill 1968, Dover 1985), ch. 5, the prismatic
 * space-frame element; the same matrix is printed in McGuire, Gallagher and Ziemian, Matrix Structural
 * Analysis (2nd ed., Wiley 2000), ch. 4. The transformation to global axes is K = T^T k T with T four
 * copies of the 3 x 3 direction-cosine matrix on its diagonal (both texts, same chapters).
 *
 * <p>Matrices are flat row-major arrays: 9 entries for the axes, 144 for a 12 x 12 stiffness.
 */
final class BeamElementMatrix {
    /** An element closer than this to the global Z direction (|cos| above it) takes X as its reference. */
    private static final double NEAR_VERTICAL_COSINE = 0.9;
    /** An orientation within this sine of the element axis cannot fix the local z' axis. */
    private static final double PARALLEL_SINE = 1e-6;

    private final double[] axes;
    private final double[] local;

    private BeamElementMatrix(double[] axes, double[] local) {
        this.axes = axes;
        this.local = local;
    }

    /**
     * @param start   position of the start node (m)
     * @param end     position of the end node (m)
     * @param element the element's section and orientation
     */
    static BeamElementMatrix of(Vector3 start, Vector3 end, BeamElement element) {
        Vector3 axis = end.minus(start);
        double length = axis.length();
        return new BeamElementMatrix(localAxes(axis.times(1 / length), element.orientation()),
                localStiffness(element.section(), length));
    }

    /**
     * Local axes: x' along the element; z' the part of the orientation perpendicular to x'; y' = z' x x'.
     * Without an orientation, global Z is used, or global X for an element within about 26 degrees of Z.
     */
    static double[] localAxes(Vector3 axisX, Vector3 orientation) {
        Vector3 reference = orientation != null ? orientation.unit()
                : Math.abs(axisX.z()) > NEAR_VERTICAL_COSINE ? Vector3.UNIT_X : Vector3.UNIT_Z;
        Vector3 perpendicular = reference.minus(axisX.times(reference.dot(axisX)));
        if (perpendicular.length() < PARALLEL_SINE) {
            throw new IllegalArgumentException("element orientation " + orientation
                    + " is parallel to the element axis " + axisX + ": it cannot set the local z' axis");
        }
        Vector3 axisZ = perpendicular.unit();
        Vector3 axisY = axisZ.cross(axisX);
        return new double[] {axisX.x(), axisX.y(), axisX.z(), axisY.x(), axisY.y(), axisY.z(),
                axisZ.x(), axisZ.y(), axisZ.z()};
    }

    /** The local stiffness (Przemieniecki ch. 5): axial, torsion, bending in x'-y' (I_z), bending in x'-z' (I_y). */
    static double[] localStiffness(SectionProperties section, double length) {
        double e = section.youngsModulus();
        double[] k = new double[144];
        double axial = e * section.area() / length;
        double torsion = section.shearModulus() * section.torsionConstant() / length;
        setPair(k, 0, 6, axial);
        setPair(k, 3, 9, torsion);
        // bending in the x'-y' plane: u_y' (1, 7) with theta_z' (5, 11)
        bendingBlock(k, 1, 5, 7, 11, e * section.secondMomentZ(), length, 1);
        // bending in the x'-z' plane: u_z' (2, 8) with theta_y' (4, 10); a positive theta_y' lowers z'
        bendingBlock(k, 2, 4, 8, 10, e * section.secondMomentY(), length, -1);
        return k;
    }

    /** A bar (axial or torsion) term: +value on the diagonal, -value between the two ends. */
    private static void setPair(double[] k, int first, int second, double value) {
        k[12 * first + first] = value;
        k[12 * second + second] = value;
        k[12 * first + second] = -value;
        k[12 * second + first] = -value;
    }

    /**
     * The 4 x 4 Hermite-cubic bending block for a translation and a rotation at each end; {@code sign} is
     * +1 where a positive rotation raises the translation ahead of the node, -1 where it lowers it.
     */
    private static void bendingBlock(double[] k, int u1, int r1, int u2, int r2, double rigidity, double length,
                                     int sign) {
        double l2 = length * length;
        double shear = 12 * rigidity / (l2 * length);
        double coupling = sign * 6 * rigidity / l2;
        double near = 4 * rigidity / length;
        double far = 2 * rigidity / length;
        int[] index = {u1, r1, u2, r2};
        double[][] block = {
                {shear, coupling, -shear, coupling},
                {coupling, near, -coupling, far},
                {-shear, -coupling, shear, -coupling},
                {coupling, far, -coupling, near}};
        for (int row = 0; row < 4; row++) {
            for (int column = 0; column < 4; column++) {
                k[12 * index[row] + index[column]] = block[row][column];
            }
        }
    }

    /**
     * Writes the element stiffness in global axes, K = T^T k T, into {@code result}.
     *
     * @param result 144 entries, row-major, overwritten
     * @param half   9 entries of scratch space
     */
    void global(double[] result, double[] half) {
        for (int blockRow = 0; blockRow < 4; blockRow++) {
            for (int blockColumn = 0; blockColumn < 4; blockColumn++) {
                int corner = 36 * blockRow + 3 * blockColumn;
                // half = k_block * R, then result_block = R^T * half
                for (int a = 0; a < 3; a++) {
                    int row = corner + 12 * a;
                    for (int c = 0; c < 3; c++) {
                        half[3 * a + c] = local[row] * axes[c] + local[row + 1] * axes[3 + c]
                                + local[row + 2] * axes[6 + c];
                    }
                }
                for (int p = 0; p < 3; p++) {
                    int row = corner + 12 * p;
                    for (int c = 0; c < 3; c++) {
                        result[row + c] = axes[p] * half[c] + axes[3 + p] * half[3 + c] + axes[6 + p] * half[6 + c];
                    }
                }
            }
        }
    }

    /**
     * @param globalDisplacements the 12 end displacements and rotations in global axes (m, rad)
     * @return the 12 end forces k u in local axes (N, N m): what the nodes exert on the element
     */
    double[] localEndForces(double[] globalDisplacements) {
        double[] localDisplacements = new double[12];
        for (int block = 0; block < 4; block++) {
            Rotations.applyTo(axes, globalDisplacements, 3 * block, localDisplacements, 3 * block);
        }
        double[] forces = new double[12];
        for (int row = 0; row < 12; row++) {
            double sum = 0;
            for (int column = 0; column < 12; column++) {
                sum += local[12 * row + column] * localDisplacements[column];
            }
            forces[row] = sum;
        }
        return forces;
    }

    /** @return the 12 end forces turned from local into global axes, T^T f */
    double[] toGlobal(double[] localForces) {
        double[] global = new double[12];
        for (int block = 0; block < 4; block++) {
            Rotations.applyTransposeTo(axes, localForces, 3 * block, global, 3 * block);
        }
        return global;
    }
}
