package org.trimwright.ui.internal.workspace;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.stream.Stream;

import org.trimwright.model.spec.DemoSpec;
import org.trimwright.model.spec.SpecFiles;

/**
 * The workspace on disk: a root folder whose sub-folders are projects; a project holds trim specs
 * ({@code *.trimspec}) and folders of them. Plain files, so specs can be kept in any version control.
 */
public final class Workspace {

    /** Project created on first run, holding a copy of the bundled demo spec. */
    public static final String DEMO_PROJECT = "demo";

    private final Path root;

    public Workspace(Path root) {
        this.root = root.toAbsolutePath().normalize();
    }

    public Path root() {
        return root;
    }

    /** Creates the root and, when it holds no project yet, a demo project with the bundled demo spec. */
    public void ensureSeeded() throws IOException {
        Files.createDirectories(root);
        if (!projects().isEmpty()) {
            return;
        }
        Path project = Files.createDirectories(root.resolve(DEMO_PROJECT));
        Path demo = project.resolve(DemoSpec.FILE_NAME);
        if (!Files.exists(demo)) {
            try (InputStream in = DemoSpec.open()) {
                Files.copy(in, demo);
            }
        }
    }

    /** Project folders, by name (hidden folders and the platform's metadata are skipped). */
    public List<Path> projects() throws IOException {
        return children(root).stream().filter(Files::isDirectory).toList();
    }

    /** Spec files and sub-folders of a folder: folders first, then files, each by name. */
    public static List<Path> children(Path folder) throws IOException {
        if (!Files.isDirectory(folder)) {
            return List.of();
        }
        List<Path> out = new ArrayList<>();
        try (Stream<Path> s = Files.list(folder)) {
            s.filter(p -> !p.getFileName().toString().startsWith("."))
                    .filter(p -> Files.isDirectory(p) || isSpec(p))
                    .sorted(Comparator.comparing((Path p) -> !Files.isDirectory(p))
                            .thenComparing(p -> p.getFileName().toString().toLowerCase()))
                    .forEach(out::add);
        }
        return out;
    }

    /** True for a {@code *.trimspec} file. */
    public static boolean isSpec(Path p) {
        return Files.isRegularFile(p) && p.getFileName().toString().endsWith("." + SpecFiles.EXTENSION);
    }

    /** Checks a new file or folder name: one path segment, no separators, not hidden. */
    public static String checkName(String name) {
        if (name == null || name.isBlank()) {
            return "Enter a name.";
        }
        if (name.contains("/") || name.contains("\\") || name.startsWith(".") || name.contains("\0")) {
            return "A name cannot contain '/' or '\\' or start with '.'.";
        }
        return null;
    }

    /** The name with the spec extension added when missing. */
    public static String specFileName(String name) {
        String ext = "." + SpecFiles.EXTENSION;
        return name.endsWith(ext) ? name : name + ext;
    }
}
