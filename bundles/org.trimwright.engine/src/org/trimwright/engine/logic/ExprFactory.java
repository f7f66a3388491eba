package org.trimwright.engine.logic;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Creates hash-consed {@link Expr} nodes: equal structure gives the same node. Not thread-safe. */
public final class ExprFactory {

    private record Key(Expr.Kind kind, int var, List<Integer> argIds) {
    }

    private final Map<Key, Expr> nodes = new HashMap<>();

    private Expr make(Expr.Kind kind, int var, List<Expr> args) {
        List<Integer> ids = new ArrayList<>(args.size());
        for (Expr a : args) {
            ids.add(a.id());
        }
        return nodes.computeIfAbsent(new Key(kind, var, ids), k -> new Expr(nodes.size(), kind, var, args));
    }

    /** Register input {@code code[i]}. */
    public Expr var(int i) {
        return make(Expr.Kind.VAR, i, List.of());
    }

    /** Complement; {@code not(not(x))} is x. */
    public Expr not(Expr x) {
        return x.kind() == Expr.Kind.NOT ? x.args().get(0) : make(Expr.Kind.NOT, -1, List.of(x));
    }

    /** Conjunction of one or more terms (one term is returned unchanged). */
    public Expr and(List<Expr> terms) {
        return terms.size() == 1 ? terms.get(0) : make(Expr.Kind.AND, -1, terms);
    }

    /** Conjunction of two terms. */
    public Expr and(Expr a, Expr b) {
        return and(List.of(a, b));
    }

    /** Disjunction of one or more terms (one term is returned unchanged). */
    public Expr or(List<Expr> terms) {
        return terms.size() == 1 ? terms.get(0) : make(Expr.Kind.OR, -1, terms);
    }

    /** Disjunction of two terms. */
    public Expr or(Expr a, Expr b) {
        return or(List.of(a, b));
    }

    /** Exclusive or of two terms. */
    public Expr xor(Expr a, Expr b) {
        return make(Expr.Kind.XOR, -1, List.of(a, b));
    }
}
