package org.shutline.io;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A parsed WKT1 CRS node: a keyword and its arguments, each a quoted string, a
 * number (kept as text) or a child node. Brackets may be {@code []} or {@code ()}.
 * Parsing is iterative over an explicit stack; anything malformed throws
 * {@link IllegalArgumentException} with the position.
 */
final class Wkt {
    final String keyword;
    final List<Object> args = new ArrayList<>();

    private Wkt(String keyword) {
        this.keyword = keyword.toUpperCase(Locale.ROOT);
    }

    static Wkt parse(String text) {
        List<Wkt> stack = new ArrayList<>();
        Wkt root = null;
        int i = 0;
        int n = text.length();
        while (i < n) {
            char c = text.charAt(i);
            if (Character.isWhitespace(c) || c == ',') {
                i++;
            } else if (c == ']' || c == ')') {
                if (stack.isEmpty()) throw new IllegalArgumentException("unbalanced bracket at " + i);
                stack.remove(stack.size() - 1);
                i++;
            } else if (c == '"') {
                int end = text.indexOf('"', i + 1);
                if (end < 0 || stack.isEmpty()) throw new IllegalArgumentException("bad string at " + i);
                stack.get(stack.size() - 1).args.add(text.substring(i + 1, end));
                i = end + 1;
            } else {
                int j = i;
                while (j < n && "[](),\"".indexOf(text.charAt(j)) < 0 && !Character.isWhitespace(text.charAt(j))) j++;
                String word = text.substring(i, j);
                int k = j;
                while (k < n && Character.isWhitespace(text.charAt(k))) k++;
                if (k < n && (text.charAt(k) == '[' || text.charAt(k) == '(')) {
                    Wkt node = new Wkt(word);
                    if (stack.isEmpty()) {
                        if (root != null) throw new IllegalArgumentException("text after the CRS at " + i);
                        root = node;
                    } else {
                        stack.get(stack.size() - 1).args.add(node);
                    }
                    stack.add(node);
                    i = k + 1;
                } else {
                    if (stack.isEmpty() || word.isEmpty()) throw new IllegalArgumentException("unexpected '" + word + "' at " + i);
                    stack.get(stack.size() - 1).args.add(word);
                    i = j;
                }
            }
        }
        if (root == null || !stack.isEmpty()) throw new IllegalArgumentException("incomplete WKT");
        return root;
    }

    /** The first child node with this keyword, or null. */
    Wkt child(String kw) {
        for (Object a : args) if (a instanceof Wkt w && w.keyword.equals(kw)) return w;
        return null;
    }

    List<Wkt> children(String kw) {
        List<Wkt> out = new ArrayList<>();
        for (Object a : args) if (a instanceof Wkt w && w.keyword.equals(kw)) out.add(w);
        return out;
    }

    /** Argument {@code i} as text (the name for most nodes is argument 0). */
    String text(int i) {
        return i < args.size() && args.get(i) instanceof String s ? s : null;
    }

    double number(int i) {
        String s = text(i);
        if (s == null) throw new IllegalArgumentException(keyword + " lacks a number at argument " + i);
        try {
            double d = Double.parseDouble(s);
            if (!Double.isFinite(d)) throw new IllegalArgumentException(keyword + ": '" + s + "' is not a finite number");
            return d;
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException(keyword + ": '" + s + "' is not a number", e);
        }
    }
}
