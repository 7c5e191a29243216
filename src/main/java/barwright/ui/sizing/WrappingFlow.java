package barwright.ui.sizing;

import java.awt.Container;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Insets;

/**
 * A left-aligned flow that reports the height of the lines it wraps into at the width it is given: plain
 * {@link FlowLayout} asks for one line, so with large text on a small screen the parts that wrapped to a second
 * line were cut off. Event thread.
 */
final class WrappingFlow extends FlowLayout {
    WrappingFlow(int horizontalGap, int verticalGap) {
        super(FlowLayout.LEFT, horizontalGap, verticalGap);
    }

    @Override
    public Dimension preferredLayoutSize(Container target) {
        return wrapped(target, true);
    }

    @Override
    public Dimension minimumLayoutSize(Container target) {
        return wrapped(target, false);
    }

    private Dimension wrapped(Container target, boolean preferred) {
        synchronized (target.getTreeLock()) {
            // the room the parent has now (the target's own width may still be the one before a resize)
            Container parent = target.getParent();
            int width = parent != null && parent.getWidth() > 0
                    ? parent.getWidth() - parent.getInsets().left - parent.getInsets().right : target.getWidth();
            if (width <= 0) {
                width = Integer.MAX_VALUE;
            }
            Insets insets = target.getInsets();
            int room = width - insets.left - insets.right - 2 * getHgap();
            int lineWidth = 0;
            int lineHeight = 0;
            int height = 0;
            int widest = 0;
            for (int i = 0; i < target.getComponentCount(); i++) {
                var part = target.getComponent(i);
                if (!part.isVisible()) {
                    continue;
                }
                Dimension size = preferred ? part.getPreferredSize() : part.getMinimumSize();
                if (lineWidth > 0 && lineWidth + getHgap() + size.width > room) {
                    height += lineHeight + getVgap();
                    widest = Math.max(widest, lineWidth);
                    lineWidth = 0;
                    lineHeight = 0;
                }
                lineWidth += (lineWidth > 0 ? getHgap() : 0) + size.width;
                lineHeight = Math.max(lineHeight, size.height);
            }
            height += lineHeight;
            widest = Math.max(widest, lineWidth);
            return new Dimension(Math.min(widest, room) + insets.left + insets.right + 2 * getHgap(),
                    height + insets.top + insets.bottom + 2 * getVgap());
        }
    }
}
