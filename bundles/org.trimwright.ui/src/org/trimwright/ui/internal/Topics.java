package org.trimwright.ui.internal;

/** Event topics and context keys the workbench parts share (IEventBroker / IEclipseContext). */
public final class Topics {

    /** A spec editor's selection: data is a {@link org.trimwright.ui.internal.doc.Selection}. */
    public static final String SELECTION = "org/trimwright/ui/selection";
    /** A spec editor became active: data is its {@link org.trimwright.ui.internal.doc.SpecDocument}. */
    public static final String ACTIVE_DOCUMENT = "org/trimwright/ui/document/active";
    /** Reveal an element in its editor: data is a {@link org.trimwright.ui.internal.doc.Selection}. */
    public static final String REVEAL = "org/trimwright/ui/reveal";
    /** Files in the workspace changed (created, renamed, deleted, saved as). */
    public static final String WORKSPACE_CHANGED = "org/trimwright/ui/workspace/changed";
    /** Preferences changed: analysis settings must be re-read. */
    public static final String PREFERENCES_CHANGED = "org/trimwright/ui/preferences/changed";
    /** Ask the field views to run the analysis of the current field again. */
    public static final String ANALYSE = "org/trimwright/ui/analyse";

    /** Application-context key of the last active spec editor part object. */
    public static final String ACTIVE_EDITOR = "org.trimwright.ui.activeEditor";
    /** Application-context key of the last {@link org.trimwright.ui.internal.doc.Selection} of any spec editor. */
    public static final String LAST_SELECTION = "org.trimwright.ui.lastSelection";
    /** Contribution of spec editor parts. */
    public static final String EDITOR_CLASS =
            "bundleclass://org.trimwright.ui/org.trimwright.ui.internal.editor.SpecEditorPart";
    /** Part descriptor of spec editors. */
    public static final String EDITOR_DESCRIPTOR = "org.trimwright.ui.partdescriptor.speceditor";
    /** Part stack that holds spec editors. */
    public static final String EDITOR_STACK = "org.trimwright.ui.stack.editors";
    /** Persisted-state key of an editor's file. */
    public static final String FILE_KEY = "org.trimwright.ui.file";

    private Topics() {
    }
}
