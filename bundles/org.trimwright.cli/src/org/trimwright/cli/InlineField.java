package org.trimwright.cli;

import java.util.List;

import org.trimwright.analysis.FieldInputs;
import org.trimwright.analysis.MismatchInputs;
import org.trimwright.engine.coding.CodingScheme;
import org.trimwright.engine.coding.FieldCoding;
import org.trimwright.engine.coding.SignedFormat;
import org.trimwright.engine.mismatch.ElementModel;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.Limits;
import org.trimwright.engine.mismatch.sizing.SizingRequest;
import org.trimwright.engine.units.SiValue;

/** A field described by command-line options instead of a spec file. */
record InlineField(String name, FieldInputs inputs, MismatchInputs mismatch, SizingRequest sizing) {

    /** Options (and flags) that describe an inline field. */
    static final List<String> OPTIONS = List.of("bits", "coding", "unary-bits", "signed", "at-zero", "step",
            "zero-state", "active-low", "unit-sigma", "max-dnl", "max-inl", "inl-definition", "target-yield",
            "max-risk", "spread-min", "spread-max", "accuracy");

    static InlineField parse(Args a) {
        int bits = a.integer("bits", 1, FieldCoding.MAX_BITS, -1);
        if (bits < 0) {
            throw new UsageException("option --bits is required (or give FILE BLOCK/REGISTER/FIELD)");
        }
        CodingScheme scheme;
        SignedFormat format;
        SiValue atZero;
        SiValue step;
        try {
            scheme = CodingScheme.fromKey(a.required("coding"));
            format = a.has("signed") ? SignedFormat.fromKey(a.value("signed")) : SignedFormat.UNSIGNED;
            atZero = SiValue.parse(a.required("at-zero"));
            step = SiValue.parse(a.required("step"));
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        if (scheme == CodingScheme.SEGMENTED && !a.has("unary-bits")) {
            throw new UsageException("--coding segmented needs --unary-bits M (1.." + bits + ")");
        }
        if (scheme != CodingScheme.SEGMENTED && a.has("unary-bits")) {
            throw new UsageException("--unary-bits applies to --coding segmented only");
        }
        int unary = a.integer("unary-bits", 1, bits, 0);
        if (step.unit() != atZero.unit() && !(atZero.value() == 0 && atZero.unit().symbol().isEmpty())) {
            throw new UsageException("--at-zero " + a.value("at-zero") + " and --step " + a.value("step")
                    + " have different units");
        }
        FieldCoding coding;
        try {
            coding = new FieldCoding(bits, scheme, unary, format, a.flag("zero-state"), a.flag("active-low"));
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
        String name = "field_" + bits + "b_" + scheme.key().replace('-', '_');
        FieldInputs in = new FieldInputs("(inline)", coding, atZero.value(), step.value(), step.unit());
        return new InlineField(name, in, mismatch(a), sizing(a, step, bits));
    }

    private static MismatchInputs mismatch(Args a) {
        if (!a.has("unit-sigma")) {
            for (String o : List.of("max-dnl", "max-inl", "inl-definition", "target-yield", "max-risk")) {
                if (a.has(o)) {
                    throw new UsageException("--" + o + " needs --unit-sigma (the mismatch statistics are off"
                            + " without it)");
                }
            }
            return null;
        }
        double sigmaPercent = a.number("unit-sigma", 0, 100, 0);
        Limits d = MismatchInputs.DEFAULT_LIMITS;
        InlDefinition def = d.inlDefinition();
        if (a.has("inl-definition")) {
            switch (a.value("inl-definition")) {
                case "endpoint" -> def = InlDefinition.ENDPOINT;
                case "best-fit" -> def = InlDefinition.BEST_FIT;
                case "absolute" -> def = InlDefinition.ABSOLUTE;
                default -> throw new UsageException("--inl-definition '" + a.value("inl-definition")
                        + "' (expected endpoint, best-fit or absolute)");
            }
        }
        try {
            Limits limits = new Limits(a.number("max-dnl", 1e-9, 1e9, d.maxDnlLsb()),
                    a.number("max-inl", 1e-9, 1e9, d.maxInlLsb()), def,
                    a.number("target-yield", 0, 1, d.targetYield()), a.number("max-risk", 0, 1, d.maxNonMonotonic()));
            return new MismatchInputs(ElementModel.ofUnitSigma(sigmaPercent / 100.0), limits);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }

    private static SizingRequest sizing(Args a, SiValue step, int bits) {
        boolean any = a.has("spread-min") || a.has("spread-max") || a.has("accuracy");
        if (!any) {
            return null;
        }
        try {
            SiValue lo = SiValue.parse(a.required("spread-min"));
            SiValue hi = SiValue.parse(a.required("spread-max"));
            SiValue acc = SiValue.parse(a.required("accuracy"));
            for (SiValue v : List.of(lo, hi, acc)) {
                if (v.unit() != step.unit() && v.value() != 0) {
                    throw new UsageException("--spread-min, --spread-max and --accuracy take the step's unit ("
                            + step.unit().symbol() + "), got " + v.format());
                }
            }
            if (!(hi.value() > lo.value()) || !(acc.value() > 0)) {
                throw new UsageException("need --spread-max > --spread-min and --accuracy > 0");
            }
            return new SizingRequest(lo.value(), hi.value(), acc.value(), step.unit().symbol(), 0, 0, false, 1, bits);
        } catch (IllegalArgumentException e) {
            throw new UsageException(e.getMessage());
        }
    }
}
