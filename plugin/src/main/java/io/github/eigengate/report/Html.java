package io.github.eigengate.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * A small element tree for HTML and inline SVG that escapes by construction: text and attribute values are always
 * escaped when written, so a data-derived string (a form id, a cell, a message) can never become markup. The only
 * unescaped content is {@link #script}/{@link #style} bodies, which the report writes from constants.
 */
final class Html {

    private final String name;
    private final Map<String, String> attributes = new LinkedHashMap<>();
    private final List<Object> children = new ArrayList<>();
    private String rawBody;

    private Html(String name) {
        this.name = name;
    }

    static Html el(String name) {
        if (!name.matches("[a-zA-Z][a-zA-Z0-9]*")) {
            throw new IllegalArgumentException("not an element name: " + name);
        }
        return new Html(name);
    }

    /** An element with a class and text. */
    static Html el(String name, String cssClass, String text) {
        return el(name).cls(cssClass).text(text);
    }

    Html attr(String key, String value) {
        if (!key.matches("[a-zA-Z][a-zA-Z0-9:-]*")) {
            throw new IllegalArgumentException("not an attribute name: " + key);
        }
        attributes.put(key, value);
        return this;
    }

    Html attr(String key, double value) {
        return attr(key, num(value));
    }

    Html cls(String cssClass) {
        return cssClass == null || cssClass.isEmpty() ? this : attr("class", cssClass);
    }

    Html text(String text) {
        children.add(text == null ? "" : text);
        return this;
    }

    Html add(Html child) {
        children.add(child);
        return this;
    }

    Html addAll(List<Html> more) {
        children.addAll(more);
        return this;
    }

    /** A {@code <script>} or {@code <style>} whose body is a constant of the report (never data). */
    static Html script(String constantBody) {
        Html h = new Html("script");
        h.rawBody = constantBody;
        return h;
    }

    static Html style(String constantBody) {
        Html h = new Html("style");
        h.rawBody = constantBody;
        return h;
    }

    private static final java.util.Set<String> VOID = java.util.Set.of("meta", "br", "hr", "input", "link", "img");

    void write(StringBuilder b) {
        b.append('<').append(name);
        for (Map.Entry<String, String> a : attributes.entrySet()) {
            b.append(' ').append(a.getKey()).append("=\"").append(escape(a.getValue())).append('"');
        }
        b.append('>');
        if (VOID.contains(name)) {
            return;
        }
        if (rawBody != null) {
            b.append(rawBody);
        }
        for (Object c : children) {
            if (c instanceof Html h) {
                h.write(b);
            } else {
                b.append(escape((String) c));
            }
        }
        b.append("</").append(name).append('>');
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder();
        write(b);
        return b.toString();
    }

    /** Escapes the five characters that could end text or an attribute value; drops other control characters. */
    static String escape(String s) {
        StringBuilder b = new StringBuilder(s.length() + 16);
        for (int i = 0; i < s.length(); i++) {
            char c = s.charAt(i);
            switch (c) {
                case '&' -> b.append("&amp;");
                case '<' -> b.append("&lt;");
                case '>' -> b.append("&gt;");
                case '"' -> b.append("&quot;");
                case '\'' -> b.append("&#39;");
                default -> {
                    if (c < 0x20 && c != '\n' && c != '\t') {
                        b.append('\uFFFD');
                    } else {
                        b.append(c);
                    }
                }
            }
        }
        return b.toString();
    }

    /** A coordinate for SVG: two decimals, no locale. */
    static String num(double v) {
        if (!Double.isFinite(v)) {
            return "0";
        }
        String s = String.format(java.util.Locale.ROOT, "%.2f", v);
        return s.equals("-0.00") ? "0.00" : s;
    }

    /** An anchor-safe id made of the parts: letters, digits and '-', others hex-escaped so distinct inputs stay distinct. */
    static String anchor(String... parts) {
        StringBuilder b = new StringBuilder();
        for (String part : parts) {
            if (b.length() > 0) {
                b.append("--");
            }
            for (int i = 0; i < part.length(); i++) {
                char c = part.charAt(i);
                if ((c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || (c >= '0' && c <= '9')) {
                    b.append(c);
                } else {
                    b.append('_').append(Integer.toHexString(c)).append('_');
                }
            }
        }
        return b.toString();
    }
}
