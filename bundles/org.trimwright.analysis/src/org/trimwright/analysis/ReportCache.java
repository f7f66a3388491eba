package org.trimwright.analysis;

import java.util.Map;
import java.util.WeakHashMap;

import org.eclipse.emf.ecore.EAttribute;
import org.eclipse.emf.ecore.EObject;
import org.trimwright.model.Field;
import org.trimwright.model.Register;

/**
 * One immutable {@link FieldReport} per field, recomputed only when something the analysis reads has changed:
 * the field's attributes, its target, coding, element and limits, the register width, or the settings.
 * Thread-safe; fields are held weakly, so a closed spec's reports go with it.
 */
public final class ReportCache {

    private record Entry(String fingerprint, FieldReport report) {
    }

    private final Map<Field, Entry> entries = new WeakHashMap<>();
    private final Map<Field, Entry> quickEntries = new WeakHashMap<>();
    private volatile AnalysisSettings settings;

    public ReportCache(AnalysisSettings settings) {
        this.settings = settings;
    }

    public AnalysisSettings settings() {
        return settings;
    }

    /** New settings; reports computed with other settings are recomputed on their next request. */
    public void setSettings(AnalysisSettings newSettings) {
        this.settings = newSettings;
    }

    /** The report of {@code field}, computed now if missing or stale. */
    public FieldReport get(Field field) {
        AnalysisSettings s = settings;
        String key = key(field, s);
        FieldReport cached = current(key, field, entries);
        if (cached != null) {
            return cached;
        }
        FieldReport report = FieldAnalyzer.analyze(field, s);
        synchronized (entries) {
            entries.put(field, new Entry(key, report));
            quickEntries.remove(field);
        }
        return report;
    }

    /**
     * The full report if it is current, else a quick one ({@link FieldAnalyzer#analyzeQuick}: no segmentation advice,
     * no exact figures), computed now if missing or stale. Validation screens a whole spec with these and asks
     * {@link #get} only for the fields that need more.
     */
    public FieldReport quick(Field field) {
        AnalysisSettings s = settings;
        String key = key(field, s);
        FieldReport cached = current(key, field, entries, quickEntries);
        if (cached != null) {
            return cached;
        }
        FieldReport report = FieldAnalyzer.analyzeQuick(field, s);
        synchronized (entries) {
            quickEntries.put(field, new Entry(key, report));
        }
        return report;
    }

    /** The cached report if it is current, else null (never computes). */
    public FieldReport peek(Field field) {
        return current(key(field, settings), field, entries);
    }

    private static String key(Field field, AnalysisSettings s) {
        return fingerprint(field) + "|" + s;
    }

    /** The first current report of {@code field} in {@code maps}, or null (both maps share the entries lock). */
    @SafeVarargs
    private FieldReport current(String key, Field field, Map<Field, Entry>... maps) {
        synchronized (entries) {
            for (Map<Field, Entry> m : maps) {
                Entry e = m.get(field);
                if (e != null && e.fingerprint.equals(key)) {
                    return e.report;
                }
            }
            return null;
        }
    }

    /** Number of fields held. */
    public int size() {
        synchronized (entries) {
            return entries.size();
        }
    }

    /** A string of every value the analysis reads from the field. */
    static String fingerprint(Field field) {
        StringBuilder sb = new StringBuilder(256);
        append(sb, field);
        if (field.eContainer() instanceof Register r) {
            sb.append("|rw=").append(r.getWidth());
        }
        return sb.toString();
    }

    private static void append(StringBuilder sb, EObject o) {
        sb.append(o.eClass().getName()).append('{');
        for (EAttribute a : o.eClass().getEAllAttributes()) {
            sb.append(a.getName()).append('=');
            sb.append(o.eIsSet(a) ? String.valueOf(o.eGet(a)) : "-").append(';');
        }
        for (EObject child : o.eContents()) {
            append(sb, child);
        }
        sb.append('}');
    }
}
