package org.trimwright.export;

import java.io.BufferedOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Set;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicReference;

import org.trimwright.analysis.ReportCache;
import org.trimwright.export.csv.TestTables;
import org.trimwright.export.doc.DocumentPlan;
import org.trimwright.export.doc.HtmlDocument;
import org.trimwright.export.doc.PdfDocument;
import org.trimwright.export.doc.Section;
import org.trimwright.export.doc.SharedSections;
import org.trimwright.export.header.CHeader;
import org.trimwright.export.ipxact.IpXactComponent;
import org.trimwright.export.rtl.BlockVerilog;
import org.trimwright.export.text.CNames;
import org.trimwright.export.text.UniqueNames;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;

/**
 * Exports a spec in every requested format from one {@link SpecDigest}, so all outputs agree. File names (under the
 * output directory; {@code CHIP} is the sanitised chip name):
 * <ul>
 * <li>{@code CHIP-spec.html}, {@code CHIP-spec.pdf}: the spec document;</li>
 * <li>{@code rtl/BLOCK.v}, {@code rtl/BLOCK_tb.v}: decoders and block module, and the testbench;</li>
 * <li>{@code CHIP_regs.h}: the firmware header;</li>
 * <li>{@code csv/BLOCK_REGISTER_FIELD.csv}: test table per analysed field;</li>
 * <li>{@code CHIP.ipxact.xml}: IP-XACT component.</li>
 * </ul>
 */
public final class SpecExport {

    /**
     * How many sections one document writer may run ahead of the other: each section and chart is built once and
     * read by both, and at most this many are held at a time.
     */
    private static final int SECTION_WINDOW = 48;

    private SpecExport() {
    }

    /** What was written. */
    public record Result(List<Path> files, SpecDigest digest) {
    }

    /** Exports {@code spec} into {@code dir} (created if needed), with a new report cache. */
    public static Result export(ChipSpec spec, Path dir, ExportOptions options, ExportProgress progress)
            throws IOException {
        return export(spec, dir, options, new ReportCache(options.settings()), progress);
    }

    /**
     * Exports {@code spec} into {@code dir} (created if needed), reading and filling {@code cache} (its settings are
     * used; e.g. the workbench's cache, so reports it already has are not recomputed). Once every field is analysed,
     * this thread writes RTL, header, CSV and IP-XACT (they need no validation) while another runs the validation and
     * then starts the HTML and the PDF writer, each on its own thread, on one stream of sections that a further
     * thread builds ahead of them ({@link SharedSections}: every section and chart is built and laid out once).
     */
    public static Result export(ChipSpec spec, Path dir, ExportOptions options, ReportCache cache,
            ExportProgress progress) throws IOException {
        Files.createDirectories(dir);
        Set<ExportFormat> formats = options.formats();
        int n = fieldCount(spec);
        int docSteps = documentCount(formats);
        int total = n * (1 + docSteps + (formats.contains(ExportFormat.CSV) ? 1 : 0)) + spec.getBlocks().size() + 2;
        Counter count = new Counter(progress, total);
        SpecDigest analysed = SpecDigest.analysed(spec, options, cache, count::fromDigest, total);
        count.advance(n);
        String chip = CNames.identifier(spec.getName());
        List<Path> files = new ArrayList<>();
        // one thread per document, and one that runs the validation and then starts the documents (the problem
        // overview comes early in them), while this thread writes the formats that need no validation
        ExecutorService docThreads = Executors.newFixedThreadPool(docSteps + 1, r -> {
            Thread t = new Thread(r, "export-document");
            t.setDaemon(true);
            return t;
        });
        AtomicReference<SharedSections> shared = new AtomicReference<>();
        try {
            Future<Started> started = docThreads.submit(() -> {
                SpecDigest full = analysed.withProblems(options, cache);
                return new Started(full, documents(full, dir, options, chip, n, count, docThreads, shared));
            });
            others(spec, dir, analysed, formats, chip, files, count);
            Started s = await(started);
            List<Path> docs = new ArrayList<>();
            for (Future<Path> f : s.documents()) {
                docs.add(await(f));
            }
            files.addAll(0, docs);
            progress.report(total, total, "done: " + files.size() + " files in " + dir);
            return new Result(files, s.digest());
        } finally {
            docThreads.shutdownNow();
            if (shared.get() != null) {
                shared.get().close();
            }
        }
    }

    /** The validated digest and the document writers started from it. */
    private record Started(SpecDigest digest, List<Future<Path>> documents) {
    }

    private static int fieldCount(ChipSpec spec) {
        int n = 0;
        for (var b : spec.getBlocks()) {
            for (var r : b.getRegisters()) {
                n += r.getFields().size();
            }
        }
        return n;
    }

    /** How many of the two documents (HTML, PDF) are requested. */
    private static int documentCount(Set<ExportFormat> formats) {
        return (formats.contains(ExportFormat.HTML) ? 1 : 0) + (formats.contains(ExportFormat.PDF) ? 1 : 0);
    }

    /** Starts the HTML and PDF writers (those requested) on {@code threads}, sharing one stream of sections. */
    private static List<Future<Path>> documents(SpecDigest digest, Path dir, ExportOptions options, String chip, int n,
            Counter count, ExecutorService threads, AtomicReference<SharedSections> shared) {
        Set<ExportFormat> formats = options.formats();
        List<Future<Path>> documents = new ArrayList<>();
        if (documentCount(formats) == 0) {
            return documents;
        }
        DocumentPlan plan = new DocumentPlan(digest, options.date());
        int sections = countSections(plan);
        SharedSections feed = new SharedSections(plan.sections(), documentCount(formats), SECTION_WINDOW);
        shared.set(feed);
        if (formats.contains(ExportFormat.HTML)) {
            documents.add(writer(threads, feed, documents.size(), dir.resolve(chip + "-spec.html"),
                    count.per(sections, n), count, (in, out, tick) -> {
                        Writer w = new java.io.OutputStreamWriter(out, StandardCharsets.UTF_8);
                        HtmlDocument.write(plan, in, w, tick);
                        w.flush();
                    }));
        }
        if (formats.contains(ExportFormat.PDF)) {
            documents.add(writer(threads, feed, documents.size(), dir.resolve(chip + "-spec.pdf"),
                    count.per(sections, n), count, (in, out, tick) -> {
                        try {
                            PdfDocument.write(plan, in, out, tick);
                        } catch (com.lowagie.text.DocumentException e) {
                            throw new IOException("PDF: " + e.getMessage(), e);
                        }
                    }));
        }
        return documents;
    }

    /** Writes one document from a stream of sections. */
    private interface DocumentWriter {
        void write(Iterable<Section> sections, OutputStream out, Runnable tick) throws IOException;
    }

    /**
     * Starts writer {@code reader} of {@code feed} into file {@code p} on {@code threads} (1 MB writes: the documents
     * of a big spec are hundreds of megabytes); the writer leaves the feed however it ends.
     */
    private static Future<Path> writer(ExecutorService threads, SharedSections feed, int reader, Path p,
            Runnable tick, Counter count, DocumentWriter body) {
        return threads.submit(() -> {
            count.say("writing " + p.getFileName());
            try (OutputStream o = new BufferedOutputStream(Files.newOutputStream(p), 1 << 20)) {
                body.write(feed.reader(reader), o, tick);
            } finally {
                feed.leave(reader);
            }
            return p;
        });
    }

    private static <T> T await(Future<T> f) throws IOException {
        try {
            return f.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IOException("export interrupted", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof IOException io) {
                throw io;
            }
            if (c instanceof RuntimeException re) {
                throw re;
            }
            if (c instanceof Error err) {
                throw err;
            }
            throw new IOException(c);
        }
    }

    /** RTL, header, CSV and IP-XACT, in this order. */
    private static void others(ChipSpec spec, Path dir, SpecDigest digest, Set<ExportFormat> formats, String chip,
            List<Path> files, Counter count) throws IOException {
        if (formats.contains(ExportFormat.RTL)) {
            Path rtl = Files.createDirectories(dir.resolve("rtl"));
            UniqueNames names = new UniqueNames();
            for (Block b : spec.getBlocks()) {
                BlockVerilog v = new BlockVerilog(b, digest.fieldsOf(b));
                String base = names.unique(CNames.identifier(b.getName()));
                files.add(write(rtl.resolve(base + ".v"), v.design()));
                files.add(write(rtl.resolve(base + "_tb.v"), v.testbench()));
                count.step("wrote rtl/" + base + ".v and rtl/" + base + "_tb.v");
            }
        }
        if (formats.contains(ExportFormat.HEADER)) {
            files.add(write(dir.resolve(chip + "_regs.h"), CHeader.of(digest)));
            count.step("wrote " + chip + "_regs.h");
        }
        if (formats.contains(ExportFormat.CSV)) {
            Path csv = Files.createDirectories(dir.resolve("csv"));
            UniqueNames names = new UniqueNames();
            for (ExportedField f : digest.fields()) {
                if (f.report() != null) {
                    Path p = csv.resolve(names.unique(CNames.identifier(f.block().getName() + "_"
                            + f.register().getName() + "_" + f.field().getName())) + ".csv");
                    try (Writer w = Files.newBufferedWriter(p, StandardCharsets.UTF_8)) {
                        TestTables.write(f, w);
                    }
                    files.add(p);
                }
                count.quiet();
            }
            count.say("wrote " + files.stream().filter(p -> p.toString().endsWith(".csv")).count() + " CSV tables");
        }
        if (formats.contains(ExportFormat.IPXACT)) {
            files.add(write(dir.resolve(chip + ".ipxact.xml"), IpXactComponent.of(digest)));
            count.step("wrote " + chip + ".ipxact.xml");
        }
    }

    private static int countSections(DocumentPlan plan) {
        int s = 0;
        for (ExportedField f : plan.digest().fields()) {
            s += f.report() == null ? 3 : 11;
        }
        return Math.max(1, s);
    }

    private static Path write(Path p, String text) {
        try {
            Files.writeString(p, text, StandardCharsets.UTF_8);
            return p;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Counts work units and reports about every 5 %; thread-safe (the documents are written concurrently). */
    private static final class Counter {
        private final ExportProgress progress;
        private final int total;
        private int done;
        private int lastReported = -1;

        Counter(ExportProgress progress, int total) {
            this.progress = progress;
            this.total = total;
        }

        synchronized void say(String message) {
            progress.report(done, total, message);
        }

        synchronized void fromDigest(int d, int t, String message) {
            progress.report(d, t, message);
        }

        synchronized void advance(int units) {
            done += units;
        }

        synchronized void step(String message) {
            done++;
            say(message);
        }

        synchronized void quiet() {
            done++;
            int pct = (int) (100L * done / total);
            if (pct / 5 != lastReported / 5) {
                lastReported = pct;
                say("working");
            }
        }

        /** A per-section callback spreading {@code units} work units over about {@code sections} calls. */
        Runnable per(int sections, int units) {
            int[] calls = {0};
            int[] given = {0};
            return () -> {
                calls[0]++;
                int target = (int) Math.min(units, (long) units * calls[0] / sections);
                while (given[0] < target) {
                    given[0]++;
                    quiet();
                }
            };
        }
    }
}
