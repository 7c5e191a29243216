package barwright.ui.present;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Insets;

/**
 * A flow of controls that starts a new row where the next one would pass the edge, and asks for the height of
 * all its rows (a plain flow asks for one row and its last controls fall off the window): with the largest text
 * on a 1024x768 projector the steppers take two rows instead of being cut.
 */
final class WrappingRows extends FlowLayout {
    WrappingRows() {
        super(FlowLayout.LEADING, 10, 4);
    }

    @Override
    public Dimension preferredLayoutSize(Container target) {
        return size(target, true);
    }

    @Override
    public Dimension minimumLayoutSize(Container target) {
        return size(target, false);
    }

    private Dimension size(Container target, boolean preferred) {
        synchronized (target.getTreeLock()) {
            // the width the rows get: the first enclosing container already laid out (none yet: one long row)
            Container sized = target;
            while (sized.getWidth() == 0 && sized.getParent() != null) {
                sized = sized.getParent();
            }
            Insets insets = target.getInsets();
            int available = sized.getWidth() == 0 ? Integer.MAX_VALUE
                    : sized.getWidth() - insets.left - insets.right - 2 * getHgap();
            int width = 0;
            int height = 0;
            int rowWidth = 0;
            int rowHeight = 0;
            for (Component child : target.getComponents()) {
                if (!child.isVisible()) {
                    continue;
                }
                Dimension wanted = preferred ? child.getPreferredSize() : child.getMinimumSize();
                if (rowWidth > 0 && rowWidth + getHgap() + wanted.width > available) {
                    width = Math.max(width, rowWidth);
                    height += rowHeight + getVgap();
                    rowWidth = 0;
                    rowHeight = 0;
                }
                rowWidth += (rowWidth > 0 ? getHgap() : 0) + wanted.width;
                rowHeight = Math.max(rowHeight, wanted.height);
            }
            width = Math.max(width, rowWidth);
            height += rowHeight;
            return new Dimension(width + insets.left + insets.right + 2 * getHgap(),
                    height + insets.top + insets.bottom + 2 * getVgap());
        }
    }
}
