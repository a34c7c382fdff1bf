package org.meridian.ui;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Insets;

/**
 * A left-aligned flow of controls that wraps onto further rows when the container is narrow, and
 * asks for the height of all its rows, so a panel's header never hides a control off its edge.
 */
final class WrapLayout extends FlowLayout {
    WrapLayout(int hgap, int vgap) {
        super(FlowLayout.LEFT, hgap, vgap);
    }

    @Override
    public Dimension preferredLayoutSize(Container target) {
        return size(target, true);
    }

    @Override
    public Dimension minimumLayoutSize(Container target) {
        Dimension d = size(target, false);
        d.width = 0;
        return d;
    }

    private Dimension size(Container target, boolean preferred) {
        synchronized (target.getTreeLock()) {
            int width = target.getWidth();
            Container c = target;
            while (width == 0 && c.getParent() != null) {
                c = c.getParent();
                width = c.getWidth();
            }
            Insets in = target.getInsets();
            int max = (width == 0 ? Integer.MAX_VALUE : width) - in.left - in.right - 2 * getHgap();
            int rowWidth = 0;
            int rowHeight = 0;
            int totalWidth = 0;
            int totalHeight = 0;
            for (Component m : target.getComponents()) {
                if (!m.isVisible()) {
                    continue;
                }
                Dimension d = preferred ? m.getPreferredSize() : m.getMinimumSize();
                if (rowWidth > 0 && rowWidth + getHgap() + d.width > max) {
                    totalWidth = Math.max(totalWidth, rowWidth);
                    totalHeight += rowHeight + getVgap();
                    rowWidth = 0;
                    rowHeight = 0;
                }
                rowWidth += (rowWidth > 0 ? getHgap() : 0) + d.width;
                rowHeight = Math.max(rowHeight, d.height);
            }
            totalWidth = Math.max(totalWidth, rowWidth);
            totalHeight += rowHeight;
            return new Dimension(totalWidth + in.left + in.right + 2 * getHgap(),
                    totalHeight + in.top + in.bottom + 2 * getVgap());
        }
    }
}
