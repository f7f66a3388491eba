package org.trimwright.model.spec;

import static org.junit.jupiter.api.Assertions.assertArrayEquals;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import org.eclipse.emf.ecore.util.EcoreUtil;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.trimwright.model.ChipSpec;

class SpecFilesTest {

    @TempDir
    Path dir;

    @Test
    void savedSpecLoadsBackEqual() throws Exception {
        ChipSpec demo = DemoSpec.load();
        Path file = dir.resolve("copy.trimspec");
        SpecFiles.save(demo, file);
        ChipSpec back = SpecFiles.load(file);
        assertTrue(EcoreUtil.equals(demo, back), "round trip must keep every attribute and child");
    }

    @Test
    void saveReplacesTheFileAndLeavesNoTemporaryFiles() throws Exception {
        Path file = dir.resolve("spec.trimspec");
        Files.writeString(file, "old content");
        SpecFiles.save(DemoSpec.load(), file);
        assertTrue(Files.readString(file).contains("TMK3"));
        try (var files = Files.list(dir)) {
            assertEquals(1, files.count(), "only the target file remains");
        }
    }

    /** Classic XML attacks: external entity (XXE), entity expansion ("billion laughs"), external DTD. */
    @ParameterizedTest
    @ValueSource(strings = {
        "<?xml version=\"1.0\"?><!DOCTYPE r [<!ENTITY x SYSTEM \"file:///etc/passwd\">]>"
            + "<tw:ChipSpec xmlns:tw=\"http://trimwright.org/spec/1.0\" name=\"&x;\"/>",
        "<?xml version=\"1.0\"?><!DOCTYPE r [<!ENTITY a \"aaaaaaaaaa\"><!ENTITY b \"&a;&a;&a;&a;&a;&a;&a;&a;\">"
            + "<!ENTITY c \"&b;&b;&b;&b;&b;&b;&b;&b;\">]>"
            + "<tw:ChipSpec xmlns:tw=\"http://trimwright.org/spec/1.0\" name=\"&c;\"/>",
        "<?xml version=\"1.0\"?><!DOCTYPE r SYSTEM \"http://127.0.0.1:9/evil.dtd\">"
            + "<tw:ChipSpec xmlns:tw=\"http://trimwright.org/spec/1.0\" name=\"x\"/>"})
    void hostileXmlIsRefusedAndTheFileIsUnchanged(String payload) throws Exception {
        Path file = dir.resolve("hostile.trimspec");
        Files.writeString(file, payload);
        byte[] before = Files.readAllBytes(file);
        SpecLoadException e = assertThrows(SpecLoadException.class, () -> SpecFiles.load(file));
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
        assertTrue(e.getMessage().contains("DOCTYPE"), e.getMessage());
        assertTrue(e.getLine() >= 1, "the line is named");
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void truncatedFileNamesFileAndLine() throws Exception {
        String full = new String(DemoSpec.open().readAllBytes(), StandardCharsets.UTF_8);
        Path file = dir.resolve("cut.trimspec");
        Files.writeString(file, full.substring(0, full.length() / 2));
        byte[] before = Files.readAllBytes(file);
        SpecLoadException e = assertThrows(SpecLoadException.class, () -> SpecFiles.load(file));
        assertTrue(e.getLine() > 1, "line of the problem: " + e.getMessage());
        assertTrue(e.getMessage().contains("cut.trimspec"), e.getMessage());
        assertArrayEquals(before, Files.readAllBytes(file));
    }

    @Test
    void badAttributeValueNamesTheValue() throws Exception {
        Path file = dir.resolve("bad.trimspec");
        Files.writeString(file, "<?xml version=\"1.0\"?>\n<tw:ChipSpec xmlns:xmi=\"http://www.omg.org/XMI\" "
                + "xmi:version=\"2.0\" xmlns:tw=\"http://trimwright.org/spec/1.0\" name=\"X\">\n"
                + "  <blocks name=\"B\">\n    <registers name=\"R\" width=\"eight\"/>\n  </blocks>\n</tw:ChipSpec>\n");
        SpecLoadException e = assertThrows(SpecLoadException.class, () -> SpecFiles.load(file));
        assertTrue(e.getMessage().contains("eight"), e.getMessage());
        assertEquals(4, e.getLine(), e.getMessage());
    }

    @Test
    void missingFileIsAClearError() {
        Path file = dir.resolve("nope.trimspec");
        SpecLoadException e = assertThrows(SpecLoadException.class, () -> SpecFiles.load(file));
        assertTrue(e.getMessage().contains("no such file"), e.getMessage());
    }

    @Test
    void nonSpecXmlIsRefused() throws Exception {
        Path file = dir.resolve("other.trimspec");
        Files.writeString(file, "<?xml version=\"1.0\"?><html><body/></html>");
        assertThrows(SpecLoadException.class, () -> SpecFiles.load(file));
    }
}
