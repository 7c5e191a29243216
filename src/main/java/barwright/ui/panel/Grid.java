package barwright.ui.panel;

import java.awt.GridBagConstraints;

/** Grid-bag constraints as the forms and the figures column use them: fill across, anchored left. */
final class Grid {
    private Grid() {
    }

    static GridBagConstraints at(int x, int y, int width) {
        GridBagConstraints constraints = new GridBagConstraints();
        constraints.gridx = x;
        constraints.gridy = y;
        constraints.gridwidth = width;
        constraints.fill = GridBagConstraints.HORIZONTAL;
        constraints.anchor = GridBagConstraints.WEST;
        return constraints;
    }
}
