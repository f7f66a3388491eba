package org.trimwright.export.doc;

import com.lowagie.text.Document;

/**
 * The vertical position on the PDF's pages: everything after the title page is drawn as page content at this
 * position, and the document is only asked for new pages. The page breaks follow the rules of OpenPDF's own
 * {@code Document} layout that this replaces, so that the pages look as they did:
 * <ul>
 * <li>a line ends the page after it when another line of the current leading would not fit below it;</li>
 * <li>a paragraph starts on a new page unless two of its lines fit; space before and after a paragraph is left out
 * at the top of a page and at its foot;</li>
 * <li>a block (box, table, chart) has space above it except at the top of a page, moves to the next page when it
 * does not fit, and after it the page ends when a line of the leading would not fit.</li>
 * </ul>
 * A {@link #trial()} copy lays out without drawing or starting pages, to find where content would fall (to keep a
 * heading with what follows it). Not thread-safe.
 */
final class PageFlow {

    private final Document doc;
    private final float top;
    private final float bottom;
    private final float left;
    private final float right;

    /** Depth of the position below the top of the text area. */
    private float used;
    /** Leading of the last paragraph: the room a next line needs. */
    private float leading;
    /** Height of the line being set. */
    private float pending;
    /** Nothing placed on this page yet. */
    private boolean blank = true;
    /** The page ends before the next placement (a line was drawn at its foot). */
    private boolean breakDue;
    /** Pages started: tells a trial where content falls. */
    private int page;

    /** The flow of {@code doc}'s pages (margins of its current page), at the top of a page. */
    PageFlow(Document doc) {
        this(doc, doc.top(), doc.bottom(), doc.left(), doc.right());
    }

    private PageFlow(Document doc, float top, float bottom, float left, float right) {
        this.doc = doc;
        this.top = top;
        this.bottom = bottom;
        this.left = left;
        this.right = right;
    }

    /** A copy at the same position that lays out without a document: nothing is drawn, no page is started. */
    PageFlow trial() {
        PageFlow t = new PageFlow(null, top, bottom, left, right);
        t.used = used;
        t.leading = leading;
        t.pending = pending;
        t.blank = blank;
        t.breakDue = breakDue;
        t.page = page;
        return t;
    }

    /** Whether this is a {@link #trial()}: callers draw nothing. */
    boolean isTrial() {
        return doc == null;
    }

    float top() {
        return top;
    }

    float bottom() {
        return bottom;
    }

    float left() {
        return left;
    }

    float right() {
        return right;
    }

    /** Height of the text area of a page. */
    float pageHeight() {
        return top - bottom;
    }

    /** The current position (a baseline or the top of the next block). */
    float y() {
        settle();
        return top - used;
    }

    /** Pages started so far: the page of the last line or block placed (a page ending after it not counted). */
    int page() {
        return page;
    }

    /** Whether nothing was placed on this page yet. */
    boolean blank() {
        settle();
        return blank;
    }

    /** Whether the page ends after the line just placed (draw it, then close what is open on the page). */
    boolean pageEndsHere() {
        return breakDue;
    }

    /** Marks the page as holding content (drawn by a caller at positions of its own, e.g. table rows). */
    void drawn() {
        blank = false;
    }

    /** Ends the page unless nothing is on it; the position moves to the top of the next page. */
    void newPage() {
        breakDue = false;
        if (blank) {
            return;
        }
        if (doc != null) {
            doc.newPage();
        }
        page++;
        used = 0;
        blank = true;
        pending = leading;
    }

    private void settle() {
        if (breakDue) {
            newPage();
        }
    }

    /** The empty line being set ends: a new page when a line of the leading would not fit below it. */
    private void endEmptyLine() {
        if (!(used + pending + leading < pageHeight())) {
            newPage();
        }
        pending = leading;
    }

    /** Places the line being set; returns its baseline. The page ends after it if another would not fit. */
    private float place(boolean breakLater) {
        blank = false;
        float baseline = top - used - pending;
        if (used + pending + leading < pageHeight()) {
            used += pending;
            pending = leading;
        } else if (breakLater) {
            breakDue = true;
            pending = leading;
        } else {
            newPage();
        }
        return baseline;
    }

    /** Space of {@code extra} points, left out on an empty page and where the page is nearly full. */
    private void space(float extra) {
        if (extra == 0 || blank || used + pending + leading > pageHeight()) {
            return;
        }
        float old = leading;
        leading = extra;
        endEmptyLine();
        place(false);
        leading = old;
    }

    /** Starts a paragraph of lines {@code lineLeading} apart with {@code spacingBefore} above it. */
    void beginParagraph(float lineLeading, float spacingBefore) {
        settle();
        space(spacingBefore);
        leading = lineLeading;
        endEmptyLine();
        if (used + pending + leading > pageHeight()) {
            newPage();
        }
        endEmptyLine();
    }

    /** The baseline of the paragraph's next line (draw it there before the next call). */
    float line() {
        settle();
        return place(true);
    }

    /** Ends a paragraph with {@code spacingAfter} below it. */
    void endParagraph(float spacingAfter) {
        settle();
        space(spacingAfter);
        endEmptyLine();
    }

    /**
     * The top of a block {@code height} points tall with {@code spacingBefore} above it: here if it fits (the space
     * is left out at the top of a page), else at the top of the next page. A block taller than a page starts at the
     * top of a page and continues on the next ones ({@link #newPage}, {@link #endBlock}).
     */
    float blockTop(float spacingBefore, float height) {
        settle();
        if (used == 0) {
            return top;
        }
        float y = top - used - spacingBefore;
        if (y - height < bottom) {
            newPage();
            return top;
        }
        return y;
    }

    /** After a block that ends at {@code y} (with its space below): the position moves there. */
    void endBlock(float y) {
        settle();
        used = top - y;
        blank = false;
        endEmptyLine();
    }

    /**
     * After a table written from the current position down to {@code y} ({@link PdfRowTable}), with
     * {@code spacingAfter} below it: a new page when that leaves no room.
     */
    void endTable(float y, float spacingAfter) {
        blank = false;
        if (y - spacingAfter - 2 < bottom) {
            newPage();
            return;
        }
        endBlock(y - spacingAfter);
    }

    /**
     * Room for a picture {@code height} points tall, half a leading below the position: its lower edge, on the next
     * page when it does not fit here. The page ends after it when a line of the leading would not fit below.
     */
    float picture(float height) {
        settle();
        if (used != 0 && top - used - height - leading / 2 < bottom) {
            newPage();
        }
        blank = false;
        float gap = leading / 2;
        float lower = top - used - height - gap;
        used += height + gap;
        if (!(used + pending + leading < pageHeight())) {
            breakDue = true;
        }
        pending = leading;
        return lower;
    }
}
