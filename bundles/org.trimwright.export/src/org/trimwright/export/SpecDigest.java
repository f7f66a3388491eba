package org.trimwright.export;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import org.trimwright.analysis.AnalysisSettings;
import org.trimwright.analysis.FieldAnalyzer;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.spec.ElementPaths;

/**
 * The spec with every field analysed once and every problem collected: the single source all formats read, so
 * they agree with each other.
 *
 * @param spec     the spec
 * @param fields   every field in block, register, field order
 * @param problems problems by element path (structural first, then the other sources)
 * @param checks   names of the problem sources that ran
 */
public record SpecDigest(ChipSpec spec, List<ExportedField> fields, Map<String, List<Problem>> problems,
        List<String> checks) {

    /** Analyses every field; reports one progress step per field. */
    public static SpecDigest of(ChipSpec spec, ExportOptions options, ExportProgress progress, int total) {
        List<Field> all = new ArrayList<>();
        for (Block b : spec.getBlocks()) {
            for (Register r : b.getRegisters()) {
                all.addAll(r.getFields());
            }
        }
        AnalysisSettings settings = options.settings();
        List<ExportedField> out = new ArrayList<>(all.size());
        int i = 0;
        for (Field f : all) {
            Register r = (Register) f.eContainer();
            Block b = (Block) r.eContainer();
            String path = ElementPaths.of(f);
            long address = b.getBaseAddress() + r.getAddressOffset();
            try {
                out.add(new ExportedField(b, r, f, path, address, FieldAnalyzer.analyze(f, settings), null));
            } catch (IllegalArgumentException e) {
                out.add(new ExportedField(b, r, f, path, address, null, e.getMessage()));
            }
            i++;
            if (i % Math.max(1, all.size() / 20) == 0 || i == all.size()) {
                progress.report(i, total, "analysed " + i + " of " + all.size() + " fields");
            }
        }
        Map<String, List<Problem>> problems = new LinkedHashMap<>();
        List<ProblemSource> sources = new ArrayList<>();
        sources.add(new StructuralProblems());
        sources.addAll(options.problemSources());
        List<String> checks = new ArrayList<>();
        for (ProblemSource s : sources) {
            checks.add(s.name());
            for (Problem p : s.problems(spec)) {
                problems.computeIfAbsent(p.path(), k -> new ArrayList<>()).add(p);
            }
        }
        return new SpecDigest(spec, List.copyOf(out), problems, List.copyOf(checks));
    }

    /** Problems of one element path (empty list if none). */
    public List<Problem> problemsOf(String path) {
        return problems.getOrDefault(path, List.of());
    }

    /** Fields of one block, in order. */
    public List<ExportedField> fieldsOf(Block b) {
        List<ExportedField> l = new ArrayList<>();
        for (ExportedField f : fields) {
            if (f.block() == b) {
                l.add(f);
            }
        }
        return l;
    }
}
