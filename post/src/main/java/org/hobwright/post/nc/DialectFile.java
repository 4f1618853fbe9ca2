package org.hobwright.post.nc;

import com.fasterxml.jackson.annotation.JsonProperty;
import java.util.List;
import java.util.Map;

/**
 * A dialect file exactly as written, bound by Jackson. Every key is optional here so that a
 * missing one becomes a finding naming the line, not a binding error; {@link DialectLoader}
 * checks them. The format is documented in the post module's README.
 */
record DialectFile(
        @JsonProperty("$schema") String schema,
        String format,
        Integer version,
        String name,
        String description,
        String lineEnding,
        Integer maxLineLength,
        LineNumbers lineNumbers,
        Integer programNumber,
        Decimals decimals,
        Boolean trailingZeros,
        Comments comments,
        Axes axes,
        Rotations rotation,
        List<String> prologue,
        List<String> epilogue,
        Map<String, List<String>> templates) {

    /** Line numbering: {@code word} then a number from {@code start}, step {@code step}. */
    record LineNumbers(String word, Integer start, Integer step) {
    }

    /** Decimals per kind of value. */
    record Decimals(Integer mm, @JsonProperty("in") Integer inch, Integer mmPerRev, Integer inPerRev, Integer deg,
                    Integer differential, Integer s, Integer rpm) {
    }

    /** Comment rules. */
    record Comments(Boolean upperCase, String forbidden) {
    }

    /** Axis letters and conventions. */
    record Axes(Axis radial, Axis axial, Axis swivel, Axis shift) {
    }

    /** One axis. */
    record Axis(String letter, Integer sign, Boolean diameter) {
    }

    /** Direction words of both spindles. */
    record Rotations(RotationWords work, RotationWords hob) {
    }

    /** Direction words of one spindle. */
    record RotationWords(String clockwise, String counterClockwise) {
    }
}
