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

import org.trimwright.export.csv.TestTables;
import org.trimwright.export.doc.DocumentPlan;
import org.trimwright.export.doc.HtmlDocument;
import org.trimwright.export.doc.PdfDocument;
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

    private SpecExport() {
    }

    /** What was written. */
    public record Result(List<Path> files, SpecDigest digest) {
    }

    /** Exports {@code spec} into {@code dir} (created if needed). */
    public static Result export(ChipSpec spec, Path dir, ExportOptions options, ExportProgress progress)
            throws IOException {
        Files.createDirectories(dir);
        Set<ExportFormat> formats = options.formats();
        int n = 0;
        for (var b : spec.getBlocks()) {
            for (var r : b.getRegisters()) {
                n += r.getFields().size();
            }
        }
        int docSteps = (formats.contains(ExportFormat.HTML) ? 1 : 0) + (formats.contains(ExportFormat.PDF) ? 1 : 0);
        int total = n * (1 + docSteps + (formats.contains(ExportFormat.CSV) ? 1 : 0)) + spec.getBlocks().size() + 2;
        Counter count = new Counter(progress, total);
        SpecDigest digest = SpecDigest.of(spec, options, progress, total);
        count.done = n;
        String chip = CNames.identifier(spec.getName());
        List<Path> files = new ArrayList<>();
        if (formats.contains(ExportFormat.HTML) || formats.contains(ExportFormat.PDF)) {
            DocumentPlan plan = new DocumentPlan(digest, options.date());
            int sections = countSections(plan);
            if (formats.contains(ExportFormat.HTML)) {
                Path p = dir.resolve(chip + "-spec.html");
                count.say("writing " + p.getFileName());
                try (Writer w = Files.newBufferedWriter(p, StandardCharsets.UTF_8)) {
                    HtmlDocument.write(plan, w, count.per(sections, n));
                }
                files.add(p);
            }
            if (formats.contains(ExportFormat.PDF)) {
                Path p = dir.resolve(chip + "-spec.pdf");
                count.say("writing " + p.getFileName());
                try (OutputStream o = new BufferedOutputStream(Files.newOutputStream(p), 1 << 16)) {
                    PdfDocument.write(plan, o, count.per(sections, n));
                } catch (com.lowagie.text.DocumentException e) {
                    throw new IOException("PDF: " + e.getMessage(), e);
                }
                files.add(p);
            }
        }
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
        progress.report(total, total, "done: " + files.size() + " files in " + dir);
        return new Result(files, digest);
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

    /** Counts work units and reports about every 5 %. */
    private static final class Counter {
        private final ExportProgress progress;
        private final int total;
        private int done;
        private int lastReported = -1;

        Counter(ExportProgress progress, int total) {
            this.progress = progress;
            this.total = total;
        }

        void say(String message) {
            progress.report(done, total, message);
        }

        void step(String message) {
            done++;
            say(message);
        }

        void quiet() {
            done++;
            int pct = (int) (100L * done / total);
            if (pct / 5 != lastReported / 5) {
                lastReported = pct;
                say("working");
            }
        }

        /** A per-section callback spreading {@code units} work units over about {@code sections} calls. */
        Runnable per(int sections, int units) {
            int start = done;
            int[] calls = {0};
            return () -> {
                calls[0]++;
                int target = start + (int) Math.min(units, (long) units * calls[0] / sections);
                while (done < target) {
                    quiet();
                }
            };
        }
    }
}
