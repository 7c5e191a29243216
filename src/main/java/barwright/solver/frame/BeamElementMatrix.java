package barwright.solver.frame;

/**
 * The stiffness of one Euler-Bernoulli beam element, 6 freedoms per node (u_x', u_y', u_z', theta_x',
 * theta_y', theta_z' at the start, then the same at the end), in local axes and turned into global axes.
 *
 * <p>The local 12 x 12 matrix is the standard one of the direct stiffness method without shear deformation:
 * Przemieniecki, Theory of Matrix Structural Analysis (McGraw-Hill 1968, Dover 1985), ch. 5, the prismatic
 * space-frame element; the same matrix appears in McGuire, Gallagher and Ziemian, Matrix Structural
 * Analysis (2nd ed., Wiley 2000), ch. 4 (both books and chapters cited from memory). Split into 3 x 3 blocks (t = translations, r = rotations, A = start,
 * B = end) it has only four distinct ones:
 * <pre>
 *   D     = K[tA,tA] = diag(EA/L, 12 EI_z/L^3, 12 EI_y/L^3)
 *   C     = K[tA,rA]: C(y', z') = 6 EI_z/L^2, C(z', y') = -6 EI_y/L^2, else 0
 *   Rnear = K[rA,rA] = diag(GJ/L, 4 EI_y/L, 4 EI_z/L)
 *   Rfar  = K[rA,rB] = diag(-GJ/L, 2 EI_y/L, 2 EI_z/L)
 *
 *         tA     rA     tB     rB
 *   tA [  D      C     -D      C    ]
 *   rA [  C^T    Rnear -C^T    Rfar ]
 *   tB [ -D     -C      D     -C    ]
 *   rB [  C^T    Rfar  -C^T    Rnear]
 * </pre>
 * The transformation to global axes is K = T^T k T with T four copies of the 3 x 3 direction-cosine matrix
 * on its diagonal (both texts, same chapters), so only the four distinct blocks need turning. Matrices are
 * flat row-major arrays: 9 entries for a 3 x 3 block or the axes, 144 for the 12 x 12 global stiffness.
 */
final class BeamElementMatrix {
    /** An element closer than this to the global Z direction (|cos| above it) takes X as its reference. */
    private static final double NEAR_VERTICAL_COSINE = 0.9;
    /** An orientation within this sine of the element axis cannot fix the local z' axis. */
    private static final double PARALLEL_SINE = 1e-6;
    /** Where each distinct block sits in {@link #blocks}. */
    private static final int D = 0;
    private static final int C = 9;
    private static final int R_NEAR = 18;
    private static final int R_FAR = 27;
    /**
     * The block layout above, per block row and block column (tA, rA, tB, rB): which distinct block, with
     * which sign, and whether transposed.
     */
    private static final int[][] BLOCK = {{D, C, D, C}, {C, R_NEAR, C, R_FAR}, {D, C, D, C}, {C, R_FAR, C, R_NEAR}};
    private static final int[][] SIGN = {{1, 1, -1, 1}, {1, 1, -1, 1}, {-1, -1, 1, -1}, {1, 1, -1, 1}};
    private static final boolean[][] TRANSPOSED = {
            {false, false, false, false}, {true, false, true, false},
            {false, false, false, false}, {true, false, true, false}};

    private final double[] axes;
    private final double[] blocks;

    private BeamElementMatrix(double[] axes, double[] blocks) {
        this.axes = axes;
        this.blocks = blocks;
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
                localBlocks(element.section(), length));
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

    /** @return D, C, Rnear and Rfar of the class description, 9 entries each, in local axes */
    static double[] localBlocks(SectionProperties section, double length) {
        double e = section.youngsModulus();
        double bendY = e * section.secondMomentY();
        double bendZ = e * section.secondMomentZ();
        double torsion = section.shearModulus() * section.torsionConstant() / length;
        double l2 = length * length;
        double[] b = new double[36];
        b[D] = e * section.area() / length;
        b[D + 4] = 12 * bendZ / (l2 * length);
        b[D + 8] = 12 * bendY / (l2 * length);
        // a positive theta_z' raises u_y' ahead of the node; a positive theta_y' lowers u_z'
        b[C + 5] = 6 * bendZ / l2;
        b[C + 7] = -6 * bendY / l2;
        b[R_NEAR] = torsion;
        b[R_NEAR + 4] = 4 * bendY / length;
        b[R_NEAR + 8] = 4 * bendZ / length;
        b[R_FAR] = -torsion;
        b[R_FAR + 4] = 2 * bendY / length;
        b[R_FAR + 8] = 2 * bendZ / length;
        return b;
    }

    /**
     * Writes the element stiffness in global axes, K = T^T k T, into {@code result}.
     *
     * @param result  144 entries, row-major, overwritten
     * @param scratch 45 entries of scratch space
     */
    void global(double[] result, double[] scratch) {
        for (int block = D; block <= R_FAR; block += 9) {
            turn(block, scratch, 9 + block);
        }
        for (int row = 0; row < 4; row++) {
            for (int column = 0; column < 4; column++) {
                int from = 9 + BLOCK[row][column];
                int sign = SIGN[row][column];
                boolean transposed = TRANSPOSED[row][column];
                int corner = 36 * row + 3 * column;
                for (int i = 0; i < 3; i++) {
                    for (int j = 0; j < 3; j++) {
                        result[corner + 12 * i + j] = sign * scratch[from + (transposed ? 3 * j + i : 3 * i + j)];
                    }
                }
            }
        }
    }

    /** scratch[into..+8] = R^T B R for the local block B at {@code block} (scratch[0..8] is used on the way) */
    private void turn(int block, double[] scratch, int into) {
        for (int a = 0; a < 3; a++) {
            int at = block + 3 * a;
            for (int c = 0; c < 3; c++) {
                scratch[3 * a + c] = blocks[at] * axes[c] + blocks[at + 1] * axes[3 + c] + blocks[at + 2] * axes[6 + c];
            }
        }
        for (int p = 0; p < 3; p++) {
            for (int c = 0; c < 3; c++) {
                scratch[into + 3 * p + c] = axes[p] * scratch[c] + axes[3 + p] * scratch[3 + c]
                        + axes[6 + p] * scratch[6 + c];
            }
        }
    }

    /**
     * @param globalDisplacements the 12 end displacements and rotations in global axes (m, rad)
     * @return the 12 end forces k u in local axes (N, N m): what the nodes exert on the element
     */
    double[] localEndForces(double[] globalDisplacements) {
        double[] local = new double[12];
        for (int part = 0; part < 4; part++) {
            Rotations.applyTo(axes, globalDisplacements, 3 * part, local, 3 * part);
        }
        double[] forces = new double[12];
        for (int row = 0; row < 4; row++) {
            for (int column = 0; column < 4; column++) {
                int from = BLOCK[row][column];
                int sign = SIGN[row][column];
                boolean transposed = TRANSPOSED[row][column];
                for (int i = 0; i < 3; i++) {
                    double sum = 0;
                    for (int j = 0; j < 3; j++) {
                        sum += blocks[from + (transposed ? 3 * j + i : 3 * i + j)] * local[3 * column + j];
                    }
                    forces[3 * row + i] += sign * sum;
                }
            }
        }
        return forces;
    }

    /** @return the 12 end forces turned from local into global axes, T^T f */
    double[] toGlobal(double[] localForces) {
        double[] global = new double[12];
        for (int part = 0; part < 4; part++) {
            Rotations.applyTransposeTo(axes, localForces, 3 * part, global, 3 * part);
        }
        return global;
    }
}
