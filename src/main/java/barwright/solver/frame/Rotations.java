package barwright.solver.frame;

/**
 * 3 x 3 rotation helpers on flat row-major arrays of 9. A rotation R holds, as its rows, the unit vectors
 * of a set of axes in global components, so that local components are v' = R v and global ones v = R^T v'.
 */
final class Rotations {
    private static final double[] IDENTITY = {1, 0, 0, 0, 1, 0, 0, 0, 1};

    private Rotations() {
    }

    /** @return R_a B R_b^T: a global block B written in the axes R_a (rows) and R_b (columns); null means global */
    static double[] toLocal(double[] rowAxes, double[] block, double[] columnAxes) {
        double[] left = rowAxes == null ? IDENTITY : rowAxes;
        double[] right = columnAxes == null ? IDENTITY : columnAxes;
        double[] half = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                // (B R_b^T)_ij = sum_k B_ik R_b,jk
                half[3 * i + j] = block[3 * i] * right[3 * j] + block[3 * i + 1] * right[3 * j + 1]
                        + block[3 * i + 2] * right[3 * j + 2];
            }
        }
        double[] result = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                result[3 * i + j] = left[3 * i] * half[j] + left[3 * i + 1] * half[3 + j] + left[3 * i + 2] * half[6 + j];
            }
        }
        return result;
    }

    /** out[outOffset..+2] = R in[inOffset..+2] */
    static void applyTo(double[] rotation, double[] in, int inOffset, double[] out, int outOffset) {
        for (int i = 0; i < 3; i++) {
            out[outOffset + i] = rotation[3 * i] * in[inOffset] + rotation[3 * i + 1] * in[inOffset + 1]
                    + rotation[3 * i + 2] * in[inOffset + 2];
        }
    }

    /** out[outOffset..+2] = R^T in[inOffset..+2] */
    static void applyTransposeTo(double[] rotation, double[] in, int inOffset, double[] out, int outOffset) {
        for (int i = 0; i < 3; i++) {
            out[outOffset + i] = rotation[i] * in[inOffset] + rotation[3 + i] * in[inOffset + 1]
                    + rotation[6 + i] * in[inOffset + 2];
        }
    }
}
