package org.trimwright.export.doc;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;

/**
 * Hands one stream of sections to several writers running on their own threads (the HTML and the PDF document), so
 * each section, and each chart in it, is built once. A producer thread builds the sections ahead of the writers and
 * records their charts ({@link ChartFigure#drawn()}), so that work runs beside the writers instead of inside them.
 * It stays at most {@code window} sections ahead of the slowest writer: at most that many sections (and their
 * recorded charts) are held, whatever the size of the spec. A writer that stops early must {@link #leave}, so that
 * it no longer holds the others back; {@link #close} stops the producer.
 */
public final class SharedSections implements AutoCloseable {

    private final Iterator<Section> source;
    private final int window;
    private final long[] position;
    private final boolean[] gone;
    /** Sections from index {@code base} on that some writer has not read yet. */
    private final List<Section> held = new ArrayList<>();
    private long base;
    private boolean exhausted;
    private Throwable failure;
    private final Thread producer;

    /**
     * Starts the producer.
     *
     * @param source  the sections, read once (on the producer thread)
     * @param readers number of writers
     * @param window  how many sections the producer may run ahead of the slowest writer (at least 1)
     */
    public SharedSections(Iterable<Section> source, int readers, int window) {
        if (readers < 1 || window < 1) {
            throw new IllegalArgumentException("readers and window must be at least 1");
        }
        this.source = source.iterator();
        this.window = window;
        this.position = new long[readers];
        this.gone = new boolean[readers];
        this.producer = new Thread(this::produce, "export-sections");
        producer.setDaemon(true);
        producer.start();
    }

    /** The sections as writer {@code reader} sees them; iterate it on that writer's thread only. */
    public Iterable<Section> reader(int reader) {
        return () -> new Iterator<>() {
            private Section next;

            @Override
            public boolean hasNext() {
                if (next == null) {
                    next = take(reader);
                }
                return next != null;
            }

            @Override
            public Section next() {
                if (!hasNext()) {
                    throw new NoSuchElementException();
                }
                Section s = next;
                next = null;
                return s;
            }
        };
    }

    /** Writer {@code reader} reads no more sections (finished or failed). */
    public synchronized void leave(int reader) {
        gone[reader] = true;
        release();
        notifyAll();
    }

    /** Stops the producer (sections not yet read are dropped). */
    @Override
    public void close() {
        producer.interrupt();
        synchronized (this) {
            for (int i = 0; i < gone.length; i++) {
                gone[i] = true;
            }
            release();
            notifyAll();
        }
    }

    private void produce() {
        try {
            while (true) {
                synchronized (this) {
                    while (held.size() >= window && !allGone()) {
                        wait();
                    }
                    if (allGone()) {
                        return;
                    }
                }
                if (!source.hasNext()) {
                    break;
                }
                Section s = source.next();
                prepare(s);
                synchronized (this) {
                    held.add(s);
                    notifyAll();
                }
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        } catch (RuntimeException | Error e) {
            synchronized (this) {
                failure = e;
            }
        }
        synchronized (this) {
            exhausted = true;
            notifyAll();
        }
    }

    /** Records the section's charts, so the writers only paint them. */
    private static void prepare(Section s) {
        for (Part p : s.parts()) {
            if (p instanceof Part.Chart c) {
                c.figure().drawn();
            }
        }
    }

    private synchronized Section take(int reader) {
        if (gone[reader]) {
            return null;
        }
        long p = position[reader];
        try {
            while (p - base >= held.size() && !exhausted) {
                wait();
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("interrupted while waiting for the next section", e);
        }
        if (p - base >= held.size()) {
            if (failure != null) {
                throw new IllegalStateException("building the document sections failed: " + failure.getMessage(),
                        failure);
            }
            return null;
        }
        Section s = held.get((int) (p - base));
        position[reader] = p + 1;
        release();
        notifyAll();
        return s;
    }

    /** Drops the sections every remaining writer has read. */
    private void release() {
        long slowest = Long.MAX_VALUE;
        for (int i = 0; i < position.length; i++) {
            if (!gone[i]) {
                slowest = Math.min(slowest, position[i]);
            }
        }
        if (slowest == Long.MAX_VALUE) {
            slowest = base + held.size();
        }
        int drop = (int) Math.min(held.size(), slowest - base);
        if (drop > 0) {
            held.subList(0, drop).clear();
            base += drop;
        }
    }

    private boolean allGone() {
        for (boolean g : gone) {
            if (!g) {
                return false;
            }
        }
        return true;
    }
}
