package org.feedernote.report.pdf;

import java.awt.Graphics2D;

/**
 * A picture a template places with {@code <div class="figure" data-figure="name"/>}: vector
 * drawing on a Graphics2D that writes PDF (text stays text, in the note's fonts: draw with
 * {@link FigureFonts}). Drawn in points, y downwards from the figure's top left corner.
 */
public interface Figure {
    /** The height the figure takes at the given width, in points. */
    float height(float width);

    /** Draws the figure into a box of the given width and {@link #height(float) height}. */
    void draw(Graphics2D g, float width, float height);
}
