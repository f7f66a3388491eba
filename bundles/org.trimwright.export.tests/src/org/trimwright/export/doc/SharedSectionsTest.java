package org.trimwright.export.doc;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertSame;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;

import org.junit.jupiter.api.Test;

class SharedSectionsTest {

    /** Sections built on demand, counting how many exist and the largest lead over the slowest reader. */
    private static final class Source implements Iterable<Section> {
        final int n;
        final AtomicInteger built = new AtomicInteger();
        final int failAt;

        Source(int n, int failAt) {
            this.n = n;
            this.failAt = failAt;
        }

        @Override
        public Iterator<Section> iterator() {
            return new Iterator<>() {
                int i;

                @Override
                public boolean hasNext() {
                    return i < n;
                }

                @Override
                public Section next() {
                    if (i == failAt) {
                        throw new IllegalStateException("section " + i + " cannot be built");
                    }
                    built.incrementAndGet();
                    return new Section.Builder("s" + i, "Section " + i++, 2).build();
                }
            };
        }
    }

    private static List<Section> drain(Iterable<Section> it, AtomicInteger progress) {
        List<Section> l = new ArrayList<>();
        for (Section s : it) {
            l.add(s);
            progress.incrementAndGet();
        }
        return l;
    }

    @Test
    void bothReadersGetEverySectionInOrderBuiltOnceAndTheLeadStaysBounded() throws Exception {
        Source src = new Source(500, -1);
        AtomicInteger fast = new AtomicInteger();
        AtomicInteger slow = new AtomicInteger();
        int window = 8;
        try (SharedSections shared = new SharedSections(src, 2, window)) {
            CompletableFuture<List<Section>> a = CompletableFuture.supplyAsync(() -> drain(shared.reader(0), fast));
            List<Section> b = new ArrayList<>();
            int maxLead = 0;
            for (Section s : shared.reader(1)) {
                b.add(s);
                slow.incrementAndGet();
                maxLead = Math.max(maxLead, src.built.get() - slow.get());
                if (b.size() % 50 == 0) {
                    Thread.sleep(2);
                }
            }
            List<Section> la = a.get(30, TimeUnit.SECONDS);
            assertEquals(500, la.size());
            assertEquals(500, b.size());
            for (int i = 0; i < 500; i++) {
                assertEquals("s" + i, la.get(i).id());
                assertSame(la.get(i), b.get(i), "one section object for both readers");
            }
            assertEquals(500, src.built.get(), "every section built exactly once");
            assertTrue(maxLead <= window + 1, "built at most a window ahead of the slowest reader: " + maxLead);
        }
    }

    @Test
    void aReaderThatLeavesDoesNotHoldTheOtherBack() throws Exception {
        Source src = new Source(300, -1);
        try (SharedSections shared = new SharedSections(src, 2, 4)) {
            Iterator<Section> quitter = shared.reader(0).iterator();
            quitter.next();
            shared.leave(0);
            List<Section> rest = CompletableFuture.supplyAsync(() -> drain(shared.reader(1), new AtomicInteger()))
                    .get(30, TimeUnit.SECONDS);
            assertEquals(300, rest.size());
        }
    }

    @Test
    void aSectionThatCannotBeBuiltFailsTheReadersInsteadOfHangingThem() throws Exception {
        Source src = new Source(100, 40);
        try (SharedSections shared = new SharedSections(src, 1, 4)) {
            IllegalStateException e = assertThrows(IllegalStateException.class, () -> drain(shared.reader(0),
                    new AtomicInteger()));
            assertTrue(e.getMessage().contains("section 40 cannot be built"), e.getMessage());
        }
    }
}
