package org.hobwright.post.sheet;

import static org.hobwright.text.Xml.escape;

import org.hobwright.text.Decimal;

/**
 * A tiny writer of well-formed XML (XHTML with inline SVG): every element is closed, every text
 * and attribute value escaped. Attributes are given as name, value pairs.
 */
final class Markup {
    private final StringBuilder sb = new StringBuilder();

    /** Opens an element. */
    Markup open(String tag, String... attributes) {
        sb.append('<').append(tag);
        attributes(attributes);
        sb.append('>');
        return this;
    }

    /** Closes an element. */
    Markup close(String tag) {
        sb.append("</").append(tag).append(">\n");
        return this;
    }

    /**
     * A drawing coordinate: at most two decimals ({@link Decimal#plain}), without trailing zeros, a
     * lone point or negative zero ({@code 12.5}, {@code 240}, {@code -0.07}).
     */
    static String coordinate(double v) {
        if (!Double.isFinite(v) || Math.abs(v) > 1e12) {
            throw new IllegalArgumentException("drawing coordinate out of range: " + v);
        }
        return Decimal.plain(v, 2);
    }

    /** An element with text content. */
    Markup leaf(String tag, String text, String... attributes) {
        open(tag, attributes);
        sb.append(escape(text));
        sb.append("</").append(tag).append('>');
        return this;
    }

    /** An empty element. */
    Markup empty(String tag, String... attributes) {
        sb.append('<').append(tag);
        attributes(attributes);
        sb.append("/>");
        return this;
    }

    /** Escaped text. */
    Markup text(String text) {
        sb.append(escape(text));
        return this;
    }

    /** Markup written elsewhere, already well-formed. */
    Markup raw(String markup) {
        sb.append(markup);
        return this;
    }

    /** A line break in the source, for readability. */
    Markup nl() {
        sb.append('\n');
        return this;
    }

    private void attributes(String[] attributes) {
        if (attributes.length % 2 != 0) {
            throw new IllegalArgumentException("attributes come in name, value pairs, got " + attributes.length);
        }
        for (int i = 0; i < attributes.length; i += 2) {
            sb.append(' ').append(attributes[i]).append("=\"").append(escape(attributes[i + 1])).append('"');
        }
    }

    @Override
    public String toString() {
        return sb.toString();
    }
}
