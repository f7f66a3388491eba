package org.trimwright.engine.rtl;

import java.util.ArrayList;
import java.util.List;

import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;

/** The fields the RTL checks run on: every scheme at widths 1..8, plus signed, zero-state and drive variants. */
final class RtlCases {

    private RtlCases() {
    }

    static List<FieldCoding> all() {
        List<FieldCoding> cases = new ArrayList<>();
        for (CodingScheme s : CodingScheme.values()) {
            for (int n = 1; n <= 8; n++) {
                cases.add(FieldCoding.of(n, s, s == CodingScheme.SEGMENTED ? (n + 1) / 2 : 0));
            }
            for (SignedFormat f : SignedFormat.values()) {
                if (f != SignedFormat.UNSIGNED) {
                    cases.add(new FieldCoding(5, s, s == CodingScheme.SEGMENTED ? 2 : 0, f, false, false));
                }
            }
            cases.add(new FieldCoding(4, s, s == CodingScheme.SEGMENTED ? 4 : 0, SignedFormat.SIGN_MAGNITUDE,
                    s.isSelect(), true));
            if (s.isSelect()) {
                cases.add(new FieldCoding(6, s, 0, SignedFormat.UNSIGNED, true, false));
            }
            cases.add(new FieldCoding(6, s, s == CodingScheme.SEGMENTED ? 1 : 0, SignedFormat.TWOS_COMPLEMENT,
                    false, true));
        }
        return cases;
    }

    static String name(FieldCoding c) {
        return "f" + c.bits() + "_" + c.scheme().key() + "_m" + c.unaryBits() + "_" + c.signedFormat().key()
                + (c.zeroState() ? "_zero" : "") + (c.activeLow() ? "_low" : "");
    }
}
