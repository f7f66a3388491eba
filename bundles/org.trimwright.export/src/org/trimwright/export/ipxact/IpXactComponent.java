package org.trimwright.export.ipxact;

import static org.trimwright.export.text.Markup.escape;

import java.util.HashMap;
import java.util.List;
import java.util.Map;

import org.trimwright.engine.coding.StepTable;
import org.trimwright.engine.units.SiValue;
import org.trimwright.export.ExportedField;
import org.trimwright.export.SpecDigest;
import org.trimwright.export.text.CNames;
import org.trimwright.export.text.UniqueNames;
import org.trimwright.model.Access;
import org.trimwright.model.Block;
import org.trimwright.model.ChipSpec;
import org.trimwright.model.Field;
import org.trimwright.model.Register;

/**
 * The register map as an IP-XACT component (IEEE 1685-2014, namespace {@value #NS}): one memoryMap, one
 * addressBlock per block, registers with addressOffset and size, fields with bitOffset, resets, bitWidth, access and
 * (select fields) enumeratedValues, in the element order of the standard's schema. Names are sanitised to xs:Name
 * (the original spelling goes to displayName, escaped); descriptions are escaped.
 */
public final class IpXactComponent {

    /** The IEEE 1685-2014 namespace. */
    public static final String NS = "http://www.accellera.org/XMLSchema/IPXACT/1685-2014";

    private IpXactComponent() {
    }

    /** The component XML. */
    public static String of(SpecDigest digest) {
        ChipSpec spec = digest.spec();
        Map<Field, ExportedField> byField = new HashMap<>();
        for (ExportedField f : digest.fields()) {
            byField.put(f.field(), f);
        }
        StringBuilder x = new StringBuilder();
        x.append("<?xml version=\"1.0\" encoding=\"UTF-8\"?>\n");
        x.append("<ipxact:component xmlns:ipxact=\"").append(NS).append("\"\n"
                + "    xmlns:xsi=\"http://www.w3.org/2001/XMLSchema-instance\"\n"
                + "    xsi:schemaLocation=\"").append(NS).append(' ').append(NS).append("/index.xsd\">\n");
        x.append("  <ipxact:vendor>trimwright.local</ipxact:vendor>\n");
        x.append("  <ipxact:library>trim</ipxact:library>\n");
        x.append("  <ipxact:name>").append(name(spec.getName())).append("</ipxact:name>\n");
        x.append("  <ipxact:version>").append(name(spec.getRevision() == null || spec.getRevision().isBlank() ? "0"
                : spec.getRevision())).append("</ipxact:version>\n");
        x.append("  <ipxact:memoryMaps>\n    <ipxact:memoryMap>\n");
        x.append("      <ipxact:name>").append(name(spec.getName() + "_map")).append("</ipxact:name>\n");
        if (spec.getDescription() != null) {
            x.append("      <ipxact:description>").append(escape(spec.getDescription()))
                    .append("</ipxact:description>\n");
        }
        UniqueNames blocks = new UniqueNames();
        for (Block b : spec.getBlocks()) {
            block(x, b, blocks.unique(name(b.getName())), byField);
        }
        x.append("      <ipxact:addressUnitBits>8</ipxact:addressUnitBits>\n");
        x.append("    </ipxact:memoryMap>\n  </ipxact:memoryMaps>\n</ipxact:component>\n");
        return x.toString();
    }

    private static void block(StringBuilder x, Block b, String n, Map<Field, ExportedField> byField) {
        long range = 1;
        int width = 8;
        for (Register r : b.getRegisters()) {
            range = Math.max(range, r.getAddressOffset() + Math.max(1, r.getWidth() / 8));
            width = Math.max(width, r.getWidth());
        }
        x.append("      <ipxact:addressBlock>\n");
        nameGroup(x, "        ", n, b.getName(), b.getDescription());
        x.append("        <ipxact:baseAddress>'h").append(Long.toHexString(b.getBaseAddress()))
                .append("</ipxact:baseAddress>\n");
        x.append("        <ipxact:range>").append(range).append("</ipxact:range>\n");
        x.append("        <ipxact:width>").append(width).append("</ipxact:width>\n");
        x.append("        <ipxact:usage>register</ipxact:usage>\n");
        UniqueNames regs = new UniqueNames();
        for (Register r : b.getRegisters()) {
            x.append("        <ipxact:register>\n");
            nameGroup(x, "          ", regs.unique(name(r.getName())), r.getName(), r.getDescription());
            x.append("          <ipxact:addressOffset>'h").append(Long.toHexString(r.getAddressOffset()))
                    .append("</ipxact:addressOffset>\n");
            x.append("          <ipxact:size>").append(r.getWidth()).append("</ipxact:size>\n");
            x.append("          <ipxact:access>").append(access(r.getAccess())).append("</ipxact:access>\n");
            UniqueNames fields = new UniqueNames();
            for (Field f : r.getFields()) {
                field(x, f, fields.unique(name(f.getName())), byField.get(f));
            }
            x.append("        </ipxact:register>\n");
        }
        x.append("      </ipxact:addressBlock>\n");
    }

    private static void field(StringBuilder x, Field f, String n, ExportedField ef) {
        x.append("          <ipxact:field>\n");
        nameGroup(x, "            ", n, f.getName(), f.getDescription());
        x.append("            <ipxact:bitOffset>").append(f.getBitOffset()).append("</ipxact:bitOffset>\n");
        x.append("            <ipxact:resets>\n              <ipxact:reset>\n                <ipxact:value>'h")
                .append(Long.toHexString(f.getResetCode())).append("</ipxact:value>\n              </ipxact:reset>\n"
                        + "            </ipxact:resets>\n");
        x.append("            <ipxact:bitWidth>").append(f.getWidth()).append("</ipxact:bitWidth>\n");
        x.append("            <ipxact:access>").append(access(f.getAccess())).append("</ipxact:access>\n");
        if (ef != null && ef.report() != null && (ef.report().inputs().coding().scheme().isSelect()
                || f.getRole() == org.trimwright.model.FieldRole.MODE_SELECT)) {
            StepTable st = ef.report().coding().stepTable();
            if (st.size() <= 256) {
                x.append("            <ipxact:enumeratedValues>\n");
                UniqueNames values = new UniqueNames();
                for (int c = 0; c < st.size(); c++) {
                    String v = SiValue.format(st.value(c), ef.report().inputs().unit());
                    x.append("              <ipxact:enumeratedValue>\n                <ipxact:name>")
                            .append(values.unique(name("code" + c + "_" + v.replace('.', 'p').replace('-', 'm'))))
                            .append("</ipxact:name>\n                <ipxact:description>").append(escape(v))
                            .append("</ipxact:description>\n                <ipxact:value>").append(c)
                            .append("</ipxact:value>\n              </ipxact:enumeratedValue>\n");
                }
                x.append("            </ipxact:enumeratedValues>\n");
            }
        }
        x.append("          </ipxact:field>\n");
    }

    private static void nameGroup(StringBuilder x, String ind, String n, String display, String description) {
        x.append(ind).append("<ipxact:name>").append(n).append("</ipxact:name>\n");
        if (display != null && !display.equals(n)) {
            x.append(ind).append("<ipxact:displayName>").append(escape(display)).append("</ipxact:displayName>\n");
        }
        if (description != null && !description.isEmpty()) {
            x.append(ind).append("<ipxact:description>").append(escape(description))
                    .append("</ipxact:description>\n");
        }
    }

    /** A name made of letters, digits and underscores, not starting with a digit (valid xs:Name). */
    static String name(String s) {
        return CNames.identifier(s);
    }

    /** IP-XACT access of a model access. */
    static String access(Access a) {
        return switch (a) {
            case READ_ONLY -> "read-only";
            case WRITE_ONLY -> "write-only";
            default -> "read-write";
        };
    }

    /** The accesses IP-XACT 1685-2014 defines (accessType). */
    public static final List<String> ACCESS_TYPES = List.of("read-only", "write-only", "read-write", "writeOnce",
            "read-writeOnce");
}
