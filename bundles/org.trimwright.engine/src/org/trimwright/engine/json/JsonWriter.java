package org.trimwright.engine.json;

import java.util.ArrayDeque;
import java.util.Deque;

/**
 * A small streaming JSON writer (RFC 8259) with two-space indentation. Non-finite numbers are written as
 * {@code null}, since JSON has no NaN or infinity. Misuse (a value where a key is expected, unbalanced ends)
 * throws IllegalStateException.
 */
public final class JsonWriter {

    private final StringBuilder out = new StringBuilder();
    private final Deque<Frame> stack = new ArrayDeque<>();
    private boolean keyPending;

    private static final class Frame {
        final boolean object;
        int count;

        Frame(boolean object) {
            this.object = object;
        }
    }

    public JsonWriter beginObject() {
        beforeValue();
        out.append('{');
        stack.push(new Frame(true));
        return this;
    }

    public JsonWriter endObject() {
        return end(true, '}');
    }

    public JsonWriter beginArray() {
        beforeValue();
        out.append('[');
        stack.push(new Frame(false));
        return this;
    }

    public JsonWriter endArray() {
        return end(false, ']');
    }

    public JsonWriter key(String name) {
        Frame f = stack.peek();
        if (f == null || !f.object || keyPending) {
            throw new IllegalStateException("a key belongs inside an object, before its value: " + name);
        }
        if (f.count++ > 0) {
            out.append(',');
        }
        newline();
        string(name);
        out.append(": ");
        keyPending = true;
        return this;
    }

    public JsonWriter value(String s) {
        beforeValue();
        if (s == null) {
            out.append("null");
        } else {
            string(s);
        }
        return this;
    }

    public JsonWriter value(double d) {
        beforeValue();
        if (!Double.isFinite(d)) {
            out.append("null");
        } else if (d == Math.rint(d) && Math.abs(d) < 1e15) {
            out.append((long) d);
        } else {
            out.append(Double.toString(d));
        }
        return this;
    }

    public JsonWriter value(long n) {
        beforeValue();
        out.append(n);
        return this;
    }

    public JsonWriter value(boolean b) {
        beforeValue();
        out.append(b);
        return this;
    }

    public JsonWriter nullValue() {
        beforeValue();
        out.append("null");
        return this;
    }

    /** Shorthand for {@code key(name).value(v)}. */
    public JsonWriter field(String name, String v) {
        return key(name).value(v);
    }

    public JsonWriter field(String name, double v) {
        return key(name).value(v);
    }

    public JsonWriter field(String name, long v) {
        return key(name).value(v);
    }

    public JsonWriter field(String name, boolean v) {
        return key(name).value(v);
    }

    /** The document; every object and array must be closed. */
    public String toJson() {
        if (!stack.isEmpty()) {
            throw new IllegalStateException(stack.size() + " unclosed object(s) or array(s)");
        }
        return out.toString();
    }

    private JsonWriter end(boolean object, char c) {
        Frame f = stack.peek();
        if (f == null || f.object != object || keyPending) {
            throw new IllegalStateException("unbalanced end " + c);
        }
        stack.pop();
        if (f.count > 0) {
            newline();
        }
        out.append(c);
        return this;
    }

    private void beforeValue() {
        Frame f = stack.peek();
        if (f == null) {
            if (out.length() > 0) {
                throw new IllegalStateException("only one top-level value");
            }
            return;
        }
        if (f.object) {
            if (!keyPending) {
                throw new IllegalStateException("a value inside an object needs a key first");
            }
            keyPending = false;
        } else {
            if (f.count++ > 0) {
                out.append(',');
            }
            newline();
        }
    }

    private void newline() {
        out.append('\n');
        for (int i = 0; i < stack.size(); i++) {
            out.append("  ");
        }
    }

    private void string(String s) {
        out.append('"');
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '"' -> out.append("\\\"");
                case '\\' -> out.append("\\\\");
                case '\n' -> out.append("\\n");
                case '\r' -> out.append("\\r");
                case '\t' -> out.append("\\t");
                case '\b' -> out.append("\\b");
                case '\f' -> out.append("\\f");
                default -> {
                    if (c < 0x20 || c == 0x2028 || c == 0x2029) {
                        out.append(String.format("\\u%04x", (int) c));
                    } else {
                        out.append(c);
                    }
                }
            }
        }
        out.append('"');
    }
}
