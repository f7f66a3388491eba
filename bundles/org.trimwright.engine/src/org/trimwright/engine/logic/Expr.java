package org.trimwright.engine.logic;

import java.util.List;

/**
 * A node of a Boolean expression DAG over the register inputs {@code code[0..n-1]}. Nodes are created only by an
 * {@link ExprFactory}, which hash-conses them: structurally equal nodes are the same object, so sub-expressions
 * shared by several decoder outputs (predecoded lines, thermometer sub-outputs) are built once.
 */
public final class Expr {

    /** Node kinds. AND and OR take 2 or more arguments, XOR exactly 2, NOT one; VAR is a register input. */
    public enum Kind {
        VAR, NOT, AND, OR, XOR
    }

    private final int id;
    private final Kind kind;
    private final int var;
    private final List<Expr> args;

    Expr(int id, Kind kind, int var, List<Expr> args) {
        this.id = id;
        this.kind = kind;
        this.var = var;
        this.args = List.copyOf(args);
    }

    /** Unique number within its factory. */
    public int id() {
        return id;
    }

    public Kind kind() {
        return kind;
    }

    /** The register input index of a VAR node (-1 otherwise). */
    public int var() {
        return var;
    }

    public List<Expr> args() {
        return args;
    }

    /** Evaluates the expression for register code {@code code} (bit i is input i). */
    public boolean eval(int code) {
        switch (kind) {
            case VAR:
                return ((code >> var) & 1) != 0;
            case NOT:
                return !args.get(0).eval(code);
            case AND:
                for (Expr a : args) {
                    if (!a.eval(code)) {
                        return false;
                    }
                }
                return true;
            case OR:
                for (Expr a : args) {
                    if (a.eval(code)) {
                        return true;
                    }
                }
                return false;
            case XOR:
                return args.get(0).eval(code) ^ args.get(1).eval(code);
            default:
                throw new IllegalStateException(kind.name());
        }
    }

    @Override
    public String toString() {
        switch (kind) {
            case VAR:
                return "code[" + var + "]";
            case NOT:
                return "~" + args.get(0);
            default:
                StringBuilder sb = new StringBuilder("(");
                String op = kind == Kind.AND ? " & " : kind == Kind.OR ? " | " : " ^ ";
                for (int i = 0; i < args.size(); i++) {
                    sb.append(i > 0 ? op : "").append(args.get(i));
                }
                return sb.append(')').toString();
        }
    }
}
