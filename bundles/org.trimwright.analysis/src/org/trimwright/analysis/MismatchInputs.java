package org.trimwright.analysis;

import org.trimwright.engine.mismatch.CoefficientBasis;
import org.trimwright.engine.mismatch.ElementModel;
import org.trimwright.engine.mismatch.Gradient;
import org.trimwright.engine.mismatch.InlDefinition;
import org.trimwright.engine.mismatch.Limits;
import org.trimwright.engine.mismatch.PelgromCoefficient;
import org.trimwright.engine.mismatch.SwitchScaling;
import org.trimwright.engine.mismatch.sequence.SequenceKind;
import org.trimwright.model.Field;
import org.trimwright.model.MismatchSpec;
import org.trimwright.model.SwitchPlacement;
import org.trimwright.model.UnitElement;
import org.trimwright.model.spec.ElementPaths;

/**
 * The engine's mismatch view of a model field: element model and limits.
 * <p>
 * Mapping: relative sigmas are entered in percent and passed as fractions; a Pelgrom coefficient with an area gives
 * the unit sigma (a pair coefficient is divided by sqrt 2 for one device); a source-side switch adds its sigma share
 * once per switched element, a drain-side switch adds none; gradients are given in percent at the array edge.
 * Fields without limits are checked against 0.5 LSB DNL and INL at 99 % yield (common practice, no source).
 *
 * @param model  the element model
 * @param limits the acceptance limits
 */
public record MismatchInputs(ElementModel model, Limits limits) {

    /** Default limits when a field states none (common practice, no source). */
    public static final Limits DEFAULT_LIMITS = new Limits(0.5, 0.5, InlDefinition.ENDPOINT, 0.99, 1e-6);

    /** Maps the field's unit element and limits; null when the field has no unit element. */
    public static MismatchInputs of(Field field) {
        UnitElement e = field.getElement();
        if (e == null) {
            return null;
        }
        String path = ElementPaths.of(field);
        double unitSigma;
        if (e.getMismatchSpec() == MismatchSpec.PELGROM) {
            if (!(e.getAreaUm2() > 0) || !(e.getPelgromPercentUm() >= 0)) {
                throw new FieldMappingException(path, "a Pelgrom unit element needs a positive area (got "
                        + e.getAreaUm2() + " um^2) and a coefficient >= 0 (got " + e.getPelgromPercentUm() + " %um)");
            }
            PelgromCoefficient c = new PelgromCoefficient(e.getPelgromPercentUm(),
                    e.isCoefficientForPair() ? CoefficientBasis.PAIR : CoefficientBasis.SINGLE_DEVICE);
            unitSigma = c.unitSigma(e.getAreaUm2());
        } else {
            unitSigma = e.getUnitSigmaPercent() / 100.0;
        }
        if (!(unitSigma >= 0) || Double.isInfinite(unitSigma)) {
            throw new FieldMappingException(path, "unit sigma " + e.getUnitSigmaPercent() + " % is not a sigma >= 0");
        }
        double switchSigma = e.getSwitchPlacement() == SwitchPlacement.SOURCE_SIDE
                ? e.getSwitchSigmaPercent() / 100.0 : 0.0;
        SequenceKind sequence = field.getCoding() == null ? SequenceKind.SEQUENTIAL : sequence(field);
        Gradient g = new Gradient(e.getLinearGradientPercent() / 100.0, e.getQuadraticGradientPercent() / 100.0);
        ElementModel model;
        try {
            model = new ElementModel(unitSigma, switchSigma, SwitchScaling.PER_ELEMENT, g, sequence);
        } catch (IllegalArgumentException ex) {
            throw new FieldMappingException(path, ex.getMessage());
        }
        return new MismatchInputs(model, limits(field));
    }

    private static SequenceKind sequence(Field f) {
        switch (f.getCoding().getSequence()) {
            case SYMMETRIC:
                return SequenceKind.CENTRE_OUT;
            case HIERARCHICAL:
                return SequenceKind.MIRRORED_TREE;
            case OPTIMISED:
                return SequenceKind.OPTIMISED;
            default:
                return SequenceKind.SEQUENTIAL;
        }
    }

    /** The field's limits, with the defaults for unset values. */
    public static Limits limits(Field field) {
        org.trimwright.model.Limits l = field.getLimits();
        if (l == null) {
            return DEFAULT_LIMITS;
        }
        double dnl = l.isSetMaxDnlLsb() ? l.getMaxDnlLsb() : DEFAULT_LIMITS.maxDnlLsb();
        double inl = l.isSetMaxInlLsb() ? l.getMaxInlLsb() : DEFAULT_LIMITS.maxInlLsb();
        InlDefinition def;
        switch (l.getInlDefinition()) {
            case BEST_FIT:
                def = InlDefinition.BEST_FIT;
                break;
            case ABSOLUTE:
                def = InlDefinition.ABSOLUTE;
                break;
            default:
                def = InlDefinition.ENDPOINT;
        }
        try {
            return new Limits(dnl, inl, def, l.getTargetYield(), l.getMaxNonMonotonicRisk());
        } catch (IllegalArgumentException e) {
            throw new FieldMappingException(ElementPaths.of(field), e.getMessage());
        }
    }
}
