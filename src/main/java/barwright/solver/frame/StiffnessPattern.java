package barwright.solver.frame;

import org.ejml.data.DMatrixSparseCSC;

import java.util.Arrays;

/**
 * The non-zero structure of a frame's stiffness, laid out once so that element blocks are added straight
 * into place (no triplets to sort). Equation numbers are contiguous per node (see {@link DofMap}), so a
 * column of node n holds, in order, the equations of every node joined to n by an element, n included.
 */
final class StiffnessPattern {
    private final DMatrixSparseCSC matrix;
    private final int[] firstEquation;
    private final int[][] neighbours;
    private final int[][] offsets;

    private StiffnessPattern(DMatrixSparseCSC matrix, int[] firstEquation, int[][] neighbours, int[][] offsets) {
        this.matrix = matrix;
        this.firstEquation = firstEquation;
        this.neighbours = neighbours;
        this.offsets = offsets;
    }

    /** @return an all-zero matrix with room for every element coupling of the model */
    static StiffnessPattern of(FrameModel model, DofMap dofs) {
        int nodeCount = model.nodes().size();
        int[] first = new int[nodeCount];
        int[] count = new int[nodeCount];
        for (int node = 0; node < nodeCount; node++) {
            first[node] = -1;
            for (int slot = 2 * node; slot < 2 * node + 2; slot++) {
                for (int component = 0; component < 3; component++) {
                    int equation = dofs.equation(slot, component);
                    if (equation >= 0) {
                        first[node] = first[node] < 0 ? equation : first[node];
                        count[node]++;
                    }
                }
            }
        }
        int[][] neighbours = neighbours(model);
        int[][] offsets = new int[nodeCount][];
        int size = dofs.equationCount();
        DMatrixSparseCSC matrix = new DMatrixSparseCSC(size, size, 0);
        int[] columnLengths = new int[size];
        for (int node = 0; node < nodeCount; node++) {
            offsets[node] = new int[neighbours[node].length];
            int length = 0;
            for (int k = 0; k < neighbours[node].length; k++) {
                offsets[node][k] = length;
                length += count[neighbours[node][k]];
            }
            for (int j = 0; j < count[node]; j++) {
                columnLengths[first[node] + j] = length;
            }
        }
        matrix.histogramToStructure(columnLengths);
        for (int node = 0; node < nodeCount; node++) {
            for (int j = 0; j < count[node]; j++) {
                int position = matrix.col_idx[first[node] + j];
                for (int neighbour : neighbours[node]) {
                    for (int i = 0; i < count[neighbour]; i++) {
                        matrix.nz_rows[position++] = first[neighbour] + i;
                    }
                }
            }
        }
        matrix.indicesSorted = true;
        return new StiffnessPattern(matrix, first, neighbours, offsets);
    }

    /** @return for each node, the sorted nodes it shares an element with, itself included */
    private static int[][] neighbours(FrameModel model) {
        int nodeCount = model.nodes().size();
        int[] degree = new int[nodeCount];
        for (BeamElement element : model.elements()) {
            degree[element.startNode()]++;
            degree[element.endNode()]++;
        }
        int[][] joined = new int[nodeCount][];
        for (int node = 0; node < nodeCount; node++) {
            joined[node] = new int[degree[node] + 1];
            joined[node][0] = node;
            degree[node] = 1;
        }
        for (BeamElement element : model.elements()) {
            joined[element.startNode()][degree[element.startNode()]++] = element.endNode();
            joined[element.endNode()][degree[element.endNode()]++] = element.startNode();
        }
        for (int node = 0; node < nodeCount; node++) {
            joined[node] = sortedDistinct(joined[node]);
        }
        return joined;
    }

    /** @return the values sorted, each once (the lists are a few entries long: insertion sort) */
    private static int[] sortedDistinct(int[] values) {
        int[] sorted = values.clone();
        for (int i = 1; i < sorted.length; i++) {
            int value = sorted[i];
            int j = i - 1;
            while (j >= 0 && sorted[j] > value) {
                sorted[j + 1] = sorted[j];
                j--;
            }
            sorted[j + 1] = value;
        }
        int distinct = 0;
        for (int i = 0; i < sorted.length; i++) {
            if (i == 0 || sorted[i] != sorted[i - 1]) {
                sorted[distinct++] = sorted[i];
            }
        }
        return Arrays.copyOf(sorted, distinct);
    }

    /** @return the matrix being filled */
    DMatrixSparseCSC matrix() {
        return matrix;
    }

    /**
     * Adds a 3 x 3 block (flat row-major, already in the slots' axes) between two slots to the free
     * equations: row i of the block is component i of {@code rowSlot}, column j component j of
     * {@code columnSlot}; held components are skipped.
     */
    void addBlock(DofMap dofs, int rowSlot, int columnSlot, double[] block) {
        int rowNode = rowSlot / 2;
        int columnNode = columnSlot / 2;
        int[] joined = neighbours[columnNode];
        int k = 0;
        while (joined[k] != rowNode) {
            k++; // a node has a handful of neighbours: a scan beats a binary search
        }
        int shift = offsets[columnNode][k] - firstEquation[rowNode];
        for (int j = 0; j < 3; j++) {
            int column = dofs.equation(columnSlot, j);
            if (column < 0) {
                continue;
            }
            int base = matrix.col_idx[column] + shift;
            for (int i = 0; i < 3; i++) {
                int row = dofs.equation(rowSlot, i);
                if (row >= 0) {
                    matrix.nz_values[base + row] += block[3 * i + j];
                }
            }
        }
    }
}
