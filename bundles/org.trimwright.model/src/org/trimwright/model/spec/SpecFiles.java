package org.trimwright.model.spec;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.channels.FileChannel;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;
import java.util.HashMap;
import java.util.Map;

import org.eclipse.emf.common.util.URI;
import org.eclipse.emf.ecore.EObject;
import org.eclipse.emf.ecore.resource.Resource;
import org.eclipse.emf.ecore.resource.ResourceSet;
import org.eclipse.emf.ecore.resource.impl.ResourceSetImpl;
import org.eclipse.emf.ecore.util.EcoreUtil;
import org.eclipse.emf.ecore.xmi.XMIException;
import org.eclipse.emf.ecore.xmi.XMLResource;
import org.eclipse.emf.ecore.xmi.impl.XMIResourceFactoryImpl;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.TrimwrightPackage;

/**
 * Reads and writes {@code .trimspec} files (EMF XMI).
 * <p>
 * Loading refuses DOCTYPE declarations, and so external entities and entity expansion, and reports any problem
 * as a {@link SpecLoadException} naming the file, line and column; it never writes. Saving writes a temporary
 * file beside the target, forces it to disk and renames it over the target in one step.
 */
public final class SpecFiles {

    /** The file extension of trim specs, without the dot. */
    public static final String EXTENSION = "trimspec";

    private SpecFiles() {
    }

    /** A resource set that knows the trimspec format, usable inside and outside OSGi. */
    public static ResourceSet newResourceSet() {
        TrimwrightPackage.eINSTANCE.eClass();
        ResourceSet rs = new ResourceSetImpl();
        rs.getResourceFactoryRegistry().getExtensionToFactoryMap().put(EXTENSION, new XMIResourceFactoryImpl());
        rs.getResourceFactoryRegistry().getExtensionToFactoryMap().put("*", new XMIResourceFactoryImpl());
        rs.getPackageRegistry().put(TrimwrightPackage.eNS_URI, TrimwrightPackage.eINSTANCE);
        return rs;
    }

    /** Hardened parser settings and strict handling of unknown content. */
    public static Map<Object, Object> loadOptions() {
        Map<String, Boolean> features = new HashMap<>();
        features.put("http://apache.org/xml/features/disallow-doctype-decl", Boolean.TRUE);
        features.put("http://xml.org/sax/features/external-general-entities", Boolean.FALSE);
        features.put("http://xml.org/sax/features/external-parameter-entities", Boolean.FALSE);
        features.put("http://apache.org/xml/features/nonvalidating/load-external-dtd", Boolean.FALSE);
        Map<String, Object> properties = new HashMap<>();
        properties.put("http://javax.xml.XMLConstants/property/accessExternalDTD", "");
        properties.put("http://javax.xml.XMLConstants/property/accessExternalSchema", "");
        Map<Object, Object> options = new HashMap<>();
        options.put(XMLResource.OPTION_PARSER_FEATURES, features);
        options.put(XMLResource.OPTION_PARSER_PROPERTIES, properties);
        options.put(XMLResource.OPTION_DEFER_IDREF_RESOLUTION, Boolean.TRUE);
        return options;
    }

    /** Loads a spec file into a fresh resource set. */
    public static ChipSpec load(Path file) throws SpecLoadException {
        return load(file, newResourceSet());
    }

    /** Loads a spec file into the given resource set. */
    public static ChipSpec load(Path file, ResourceSet rs) throws SpecLoadException {
        if (!Files.isRegularFile(file)) {
            throw new SpecLoadException(file, 0, 0, Files.exists(file) ? "not a regular file" : "no such file", null);
        }
        Resource resource = rs.createResource(URI.createFileURI(file.toAbsolutePath().toString()));
        try (InputStream in = Files.newInputStream(file)) {
            resource.load(in, loadOptions());
        } catch (IOException | RuntimeException e) {
            rs.getResources().remove(resource);
            throw translate(file, e);
        }
        if (!resource.getErrors().isEmpty()) {
            Resource.Diagnostic first = resource.getErrors().get(0);
            rs.getResources().remove(resource);
            throw new SpecLoadException(file, first.getLine(), first.getColumn(), first.getMessage(), null);
        }
        if (resource.getContents().isEmpty() || !(resource.getContents().get(0) instanceof ChipSpec)) {
            rs.getResources().remove(resource);
            throw new SpecLoadException(file, 1, 0, "the file holds no chip spec (expected a tw:ChipSpec root"
                    + " element of namespace " + TrimwrightPackage.eNS_URI + ")", null);
        }
        return (ChipSpec) resource.getContents().get(0);
    }

    /** Loads a spec from a stream (e.g. a bundled resource); {@code name} is used in messages. */
    public static ChipSpec load(InputStream in, String name) throws SpecLoadException {
        Path shown = Path.of(name);
        Resource resource = newResourceSet().createResource(URI.createURI("memory:/" + name));
        try {
            resource.load(in, loadOptions());
        } catch (IOException | RuntimeException e) {
            throw translate(shown, e);
        }
        if (resource.getContents().isEmpty() || !(resource.getContents().get(0) instanceof ChipSpec)) {
            throw new SpecLoadException(shown, 1, 0, "the stream holds no chip spec", null);
        }
        return (ChipSpec) resource.getContents().get(0);
    }

    private static SpecLoadException translate(Path file, Exception e) {
        Throwable t = e;
        while (t != null) {
            if (t instanceof XMIException x) {
                return new SpecLoadException(file, x.getLine(), x.getColumn(), clean(x.getMessage()), e);
            }
            if (t instanceof org.xml.sax.SAXParseException p) {
                return new SpecLoadException(file, p.getLineNumber(), p.getColumnNumber(), clean(p.getMessage()), e);
            }
            if (t.getCause() == t) {
                break;
            }
            t = t.getCause();
        }
        String m = e.getMessage() == null ? e.getClass().getSimpleName() : e.getMessage();
        return new SpecLoadException(file, 0, 0, clean(m), e);
    }

    private static String clean(String message) {
        if (message == null) {
            return "unreadable XML";
        }
        String m = message.replaceAll("\\s*\\(.*?, \\d+, \\d+\\)$", "");
        if (m.contains("DOCTYPE is disallowed")) {
            return "DOCTYPE declarations are not allowed in spec files (they could pull in external entities"
                    + " or expand entities without bound): " + m;
        }
        if (m.contains("must start and end within the same entity") || m.contains("Premature end of file")) {
            return "the file ends before its XML is complete (truncated?): " + m;
        }
        return m;
    }

    /** Saves the spec atomically to {@code file}: temporary file beside it, fsync, rename. */
    public static void save(ChipSpec spec, Path file) throws IOException {
        Path target = file.toAbsolutePath();
        Path dir = target.getParent();
        Files.createDirectories(dir);
        Path tmp = Files.createTempFile(dir, "." + target.getFileName(), ".tmp");
        try {
            ResourceSet rs = newResourceSet();
            Resource resource = rs.createResource(URI.createFileURI(target.toString()));
            EObject copy = EcoreUtil.copy(spec);
            resource.getContents().add(copy);
            Map<Object, Object> options = new HashMap<>();
            options.put(XMLResource.OPTION_ENCODING, "UTF-8");
            options.put(XMLResource.OPTION_LINE_WIDTH, 100);
            try (OutputStream out = Files.newOutputStream(tmp, StandardOpenOption.TRUNCATE_EXISTING)) {
                resource.save(out, options);
            }
            try (FileChannel ch = FileChannel.open(tmp, StandardOpenOption.WRITE)) {
                ch.force(true);
            }
            try {
                Files.move(tmp, target, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, target, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
        }
    }
}
