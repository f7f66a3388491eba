package org.trimwright.engine.logic;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Maps an {@link Expr} DAG onto INV/NAND/NOR gates of a {@link GateLibrary}.
 * <p>Method: every node is built in the polarity its reader asks for, using De Morgan so no inverter is needed
 * between levels: AND true = NOR of complemented arguments, AND complemented = NAND of true arguments, OR true =
 * NAND of complemented arguments, OR complemented = NOR of true arguments, NOT swaps the requested polarity.
 * Wider AND/OR nodes are split into {@code maxFanIn} balanced groups (fan-in decomposition), each group a node of
 * its own. XOR is four NAND2 (XNOR, the complemented polarity, four NOR2). Each (node, polarity) pair is built
 * once; when the other polarity of a node already exists one inverter is added instead of a second copy.
 * Register inputs go through local buffers when the library asks for them.
 */
public final class TechMapper {

    private final GateLibrary lib;
    private final ExprFactory factory;
    private final List<Gate> gates = new ArrayList<>();
    private final Map<Long, String> built = new HashMap<>();
    private int nextNet;

    /**
     * @param lib     the gate library
     * @param factory the factory that made the expressions (used for fan-in groups)
     */
    public TechMapper(GateLibrary lib, ExprFactory factory) {
        this.lib = lib;
        this.factory = factory;
    }

    /**
     * Builds a netlist whose output i is {@code outputs.get(i)} over {@code inputCount} register inputs.
     */
    public Netlist map(int inputCount, List<Expr> outputs) {
        List<String> nets = new ArrayList<>();
        for (Expr e : outputs) {
            nets.add(net(e, true));
        }
        return new Netlist(inputCount, gates, nets);
    }

    private String gate(GateType type, List<String> inputs) {
        String out = "n" + nextNet++;
        gates.add(new Gate(type, out, inputs));
        return out;
    }

    private static long key(Expr e, boolean polarity) {
        return ((long) e.id() << 1) | (polarity ? 1 : 0);
    }

    /** The net carrying {@code e} (polarity true) or its complement (polarity false). */
    String net(Expr e, boolean polarity) {
        if (e.kind() == Expr.Kind.NOT) {
            return net(e.args().get(0), !polarity);
        }
        String done = built.get(key(e, polarity));
        if (done != null) {
            return done;
        }
        String other = built.get(key(e, !polarity));
        String result;
        if (e.kind() == Expr.Kind.VAR) {
            result = inputRail(e, polarity);
        } else if (other != null) {
            result = gate(GateType.INV, List.of(other));
        } else {
            result = build(e, polarity);
        }
        built.put(key(e, polarity), result);
        return result;
    }

    private String inputRail(Expr v, boolean polarity) {
        String pin = Netlist.inputNet(v.var());
        if (!polarity) {
            return gate(GateType.INV, List.of(pin));
        }
        return lib.inputBuffers() ? gate(GateType.INV, List.of(net(v, false))) : pin;
    }

    private String build(Expr e, boolean polarity) {
        switch (e.kind()) {
            case AND:
            case OR:
                return buildAndOr(e, polarity);
            case XOR:
                return buildXor(e, polarity);
            default:
                throw new IllegalStateException(e.kind().name());
        }
    }

    private String buildAndOr(Expr e, boolean polarity) {
        boolean and = e.kind() == Expr.Kind.AND;
        List<Expr> args = groups(e.args(), and);
        // AND true = NOR(~args); AND false = NAND(args); OR true = NAND(~args); OR false = NOR(args)
        boolean argPolarity = !polarity;
        boolean nand = and ? !polarity : polarity;
        List<String> ins = new ArrayList<>();
        for (Expr a : args) {
            ins.add(net(a, argPolarity));
        }
        return gate(nand ? GateType.nand(ins.size()) : GateType.nor(ins.size()), ins);
    }

    /** Splits arguments into at most maxFanIn balanced groups, each group a node of the same kind. */
    private List<Expr> groups(List<Expr> args, boolean and) {
        int f = lib.maxFanIn();
        if (args.size() <= f) {
            return args;
        }
        List<Expr> out = new ArrayList<>();
        int start = 0;
        for (int g = 0; g < f; g++) {
            int size = args.size() / f + (g < args.size() % f ? 1 : 0);
            List<Expr> part = args.subList(start, start + size);
            out.add(and ? factory.and(part) : factory.or(part));
            start += size;
        }
        return out;
    }

    private String buildXor(Expr e, boolean polarity) {
        String a = net(e.args().get(0), true);
        String b = net(e.args().get(1), true);
        // polarity true: XOR from four NAND2; false: XNOR from four NOR2
        GateType t = polarity ? GateType.NAND2 : GateType.NOR2;
        String m = gate(t, List.of(a, b));
        String p = gate(t, List.of(a, m));
        String q = gate(t, List.of(b, m));
        return gate(t, List.of(p, q));
    }
}
