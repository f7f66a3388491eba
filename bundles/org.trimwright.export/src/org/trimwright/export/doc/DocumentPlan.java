package org.trimwright.export.doc;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Iterator;
import java.util.List;
import java.util.NoSuchElementException;

import org.trimwright.export.ExportedField;
import org.trimwright.export.Problem;
import org.trimwright.export.SpecDigest;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;

/**
 * The content of the spec document in reading order: title page facts, register map overview, problem overview,
 * one chapter per field (grouped by block) and the appendix of full step tables. Field chapters are built one at a
 * time while a writer reads them, so a large spec never holds all its sections in memory.
 */
public final class DocumentPlan {

    /** Title page facts. */
    public record Title(String chip, String revision, String date, String author, String description) {
    }

    /** A table-of-contents entry. */
    public record Entry(String id, String title, int level) {
    }

    private final SpecDigest digest;
    private final Title title;

    public DocumentPlan(SpecDigest digest, LocalDate date) {
        this.digest = digest;
        ChipSpec s = digest.spec();
        this.title = new Title(nz(s.getName(), "(unnamed chip)"), nz(s.getRevision(), "(no revision)"),
                date.toString(), nz(s.getAuthor(), "(no author given)"), nz(s.getDescription(), ""));
    }

    public Title title() {
        return title;
    }

    public SpecDigest digest() {
        return digest;
    }

    /** Table of contents (chapters and field chapters). */
    public List<Entry> contents() {
        List<Entry> toc = new ArrayList<>();
        toc.add(new Entry("s-register-map", "Register map", 1));
        toc.add(new Entry("s-problems", "Validation problems", 1));
        for (Block b : digest.spec().getBlocks()) {
            toc.add(new Entry(blockId(b), "Block " + b.getName(), 1));
            for (ExportedField f : digest.fieldsOf(b)) {
                toc.add(new Entry(FieldSections.id(f), f.path(), 2));
            }
        }
        if (digest.fields().stream().anyMatch(FieldSections::inAppendix)) {
            toc.add(new Entry("s-appendix", "Appendix: full step tables", 1));
        }
        return toc;
    }

    private static String blockId(Block b) {
        return org.trimwright.export.text.Markup.anchor("block-" + b.getName());
    }

    /** All sections in reading order, built as they are read. */
    public Iterable<Section> sections() {
        return () -> new Iterator<>() {
            private final Iterator<Object> steps = plan().iterator();
            private final List<Section> pending = new ArrayList<>();

            @Override
            public boolean hasNext() {
                fill();
                return !pending.isEmpty();
            }

            @Override
            public Section next() {
                fill();
                if (pending.isEmpty()) {
                    throw new NoSuchElementException();
                }
                return pending.remove(0);
            }

            private void fill() {
                while (pending.isEmpty() && steps.hasNext()) {
                    pending.addAll(expand(steps.next()));
                }
            }
        };
    }

    /** The plan as steps: strings name fixed chapters, blocks open a chapter, fields expand to their chapter. */
    private List<Object> plan() {
        List<Object> l = new ArrayList<>();
        l.add("map");
        l.add("problems");
        for (Block b : digest.spec().getBlocks()) {
            l.add(b);
            l.addAll(digest.fieldsOf(b));
        }
        if (digest.fields().stream().anyMatch(FieldSections::inAppendix)) {
            l.add("appendix");
            for (ExportedField f : digest.fields()) {
                if (FieldSections.inAppendix(f)) {
                    l.add(new AppendixOf(f));
                }
            }
        }
        return l;
    }

    private record AppendixOf(ExportedField field) {
    }

    private List<Section> expand(Object step) {
        if (step instanceof ExportedField f) {
            return FieldSections.chapter(f, digest);
        }
        if (step instanceof AppendixOf a) {
            return List.of(FieldSections.appendix(a.field()));
        }
        if (step instanceof Block b) {
            return List.of(new Section.Builder(blockId(b), "Block " + b.getName(), 1)
                    .para(nz(b.getDescription(), "(no description)") + " Base address "
                            + Numbers.hex(b.getBaseAddress()) + ".").build());
        }
        return switch ((String) step) {
            case "map" -> List.of(registerMap());
            case "problems" -> List.of(problemOverview());
            default -> List.of(new Section.Builder("s-appendix", "Appendix: full step tables", 1)
                    .para("Every code of the fields whose step table is summarised in its chapter.").build());
        };
    }

    private Section registerMap() {
        Section.Builder s = new Section.Builder("s-register-map", "Register map", 1);
        s.para("Every register with its address (block base + offset), width, access, reset value and fields.");
        List<List<String>> rows = new ArrayList<>();
        for (Block b : digest.spec().getBlocks()) {
            for (Register r : b.getRegisters()) {
                StringBuilder fields = new StringBuilder();
                for (Field f : r.getFields()) {
                    fields.append(fields.length() == 0 ? "" : ", ").append(f.getName())
                            .append(Numbers.bits(f.getBitOffset(), f.getWidth()));
                }
                rows.add(List.of(Numbers.hex(b.getBaseAddress() + r.getAddressOffset()), b.getName(), r.getName(),
                        Integer.toString(r.getWidth()), r.getAccess().getLiteral(),
                        String.format("0x%X", r.getResetValue()), fields.toString()));
            }
        }
        s.add(new Part.Table(rows.size() + " registers", List.of("address", "block", "register", "bits", "access",
                "reset", "fields [msb:lsb]"), rows));
        return s.build();
    }

    private Section problemOverview() {
        Section.Builder s = new Section.Builder("s-problems", "Validation problems", 1);
        s.para("Checks that ran: " + String.join(", ", digest.checks()) + ". Each field chapter repeats its own.");
        List<List<String>> rows = new ArrayList<>();
        digest.problems().forEach((path, list) -> {
            for (Problem p : list) {
                rows.add(List.of(p.severity(), path, p.foundBy(), p.message(), p.advice() == null ? "" : p.advice()));
            }
        });
        for (ExportedField f : digest.fields()) {
            if (f.report() == null && digest.problemsOf(f.path()).stream()
                    .noneMatch(p -> "analysis.field-not-analysable".equals(p.ruleId()))) {
                rows.add(List.of("error", f.path(), "analysis", "could not be analysed: " + f.error(), ""));
            }
        }
        if (rows.isEmpty()) {
            s.para("No problems found.");
        } else {
            s.add(new Part.Table(rows.size() + " problem(s)", List.of("severity", "element", "found by [rule]",
                    "message", "advice"), rows));
        }
        return s.build();
    }

    private static String nz(String s, String dflt) {
        return s == null || s.isBlank() ? dflt : s;
    }
}
