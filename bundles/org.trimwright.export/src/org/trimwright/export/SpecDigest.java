package org.trimwright.export;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;

import org.trimwright.analysis.ReportCache;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;
import org.trimwright.model.spec.ElementPaths;

/**
 * The spec with every field analysed once and every problem collected: the single source all formats read, so
 * they agree with each other. The field reports come from one {@link ReportCache} that the problem sources read
 * too, so the validation recomputes nothing the digest has. Fields are analysed in parallel (each report depends
 * only on its field and the settings, the Monte Carlo streams on the seed, so the result is the same for any
 * thread count).
 *
 * @param spec     the spec
 * @param fields   every field in block, register, field order
 * @param problems problems by element path (in the order the sources report them)
 * @param checks   names of the problem sources that ran
 * @param byBlock  the fields of each block, in order
 */
public record SpecDigest(ChipSpec spec, List<ExportedField> fields, Map<String, List<Problem>> problems,
        List<String> checks, Map<Block, List<ExportedField>> byBlock) {

    /** Analyses every field with a new cache of the options' settings; reports progress about every 5 %. */
    public static SpecDigest of(ChipSpec spec, ExportOptions options, ExportProgress progress, int total) {
        return of(spec, options, new ReportCache(options.settings()), progress, total);
    }

    /**
     * Analyses every field through {@code cache} (reports already there are reused) and runs the problem sources on
     * the same cache.
     */
    public static SpecDigest of(ChipSpec spec, ExportOptions options, ReportCache cache, ExportProgress progress,
            int total) {
        return analysed(spec, options, cache, progress, total).withProblems(options, cache);
    }

    /**
     * Analyses every field through {@code cache} (reports already there are reused); the digest has no problems
     * and no checks yet ({@link #withProblems}).
     */
    public static SpecDigest analysed(ChipSpec spec, ExportOptions options, ReportCache cache,
            ExportProgress progress, int total) {
        List<Field> all = new ArrayList<>();
        for (Block b : spec.getBlocks()) {
            for (Register r : b.getRegisters()) {
                all.addAll(r.getFields());
            }
        }
        List<ExportedField> out = analyse(all, cache, options.settings().threads(), progress, total);
        Map<Block, List<ExportedField>> byBlock = new LinkedHashMap<>();
        for (ExportedField f : out) {
            byBlock.computeIfAbsent(f.block(), k -> new ArrayList<>()).add(f);
        }
        byBlock.replaceAll((k, v) -> List.copyOf(v));
        return new SpecDigest(spec, List.copyOf(out), Map.of(), List.of(), byBlock);
    }

    /** This digest with the problems of the options' sources (and the structural checks), run on {@code cache}. */
    public SpecDigest withProblems(ExportOptions options, ReportCache cache) {
        Map<String, List<Problem>> found = new LinkedHashMap<>();
        List<ProblemSource> sources = new ArrayList<>();
        if (options.problemSources().stream().noneMatch(ProblemSource::coversStructure)) {
            sources.add(new StructuralProblems());
        }
        sources.addAll(options.problemSources());
        List<String> ran = new ArrayList<>();
        for (ProblemSource s : sources) {
            ran.add(s.name());
            for (Problem p : s.problems(spec, cache)) {
                found.computeIfAbsent(p.path(), k -> new ArrayList<>()).add(p);
            }
        }
        return new SpecDigest(spec, fields, found, List.copyOf(ran), byBlock);
    }

    private static List<ExportedField> analyse(List<Field> all, ReportCache cache, int threads,
            ExportProgress progress, int total) {
        int n = all.size();
        int every = Math.max(1, n / 20);
        AtomicInteger done = new AtomicInteger();
        int workers = threads > 0 ? threads : Runtime.getRuntime().availableProcessors();
        ForkJoinPool pool = new ForkJoinPool(Math.max(1, Math.min(workers, n)));
        try {
            return pool.submit(() -> IntStream.range(0, n).parallel().mapToObj(i -> {
                ExportedField f = analyse(all.get(i), cache);
                int d = done.incrementAndGet();
                if (d % every == 0 || d == n) {
                    synchronized (progress) {
                        progress.report(d, total, "analysed " + d + " of " + n + " fields");
                    }
                }
                return f;
            }).toList()).get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException("export interrupted", e);
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new IllegalStateException(e.getCause());
        } finally {
            pool.shutdown();
        }
    }

    private static ExportedField analyse(Field f, ReportCache cache) {
        Register r = (Register) f.eContainer();
        Block b = (Block) r.eContainer();
        String path = ElementPaths.of(f);
        long address = b.getBaseAddress() + r.getAddressOffset();
        try {
            return new ExportedField(b, r, f, path, address, cache.get(f), null);
        } catch (IllegalArgumentException e) {
            return new ExportedField(b, r, f, path, address, null, e.getMessage());
        }
    }

    /** Problems of one element path (empty list if none). */
    public List<Problem> problemsOf(String path) {
        return problems.getOrDefault(path, List.of());
    }

    /** Fields of one block, in order (from the index, no scan). */
    public List<ExportedField> fieldsOf(Block b) {
        return byBlock.getOrDefault(b, List.of());
    }
}
