package org.hobwright.post.nc;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import org.hobwright.api.cycle.Rotation;
import org.hobwright.api.job.Units;

/**
 * A loaded and checked NC dialect. Made only by {@link DialectLoader}; every machine-specific word
 * of a program comes from here.
 *
 * @param name           the dialect's name
 * @param lineEnding     the line separator text ({@code \r\n} or {@code \n})
 * @param maxLineLength  longest allowed block, characters, line number included
 * @param numbering      line numbering, when the dialect numbers blocks
 * @param programNumbers the program numbers the control takes, with the default
 * @param toolStations   the tool stations the hob can sit in, with the default
 * @param decimals       decimals per kind of value
 * @param trailingZeros  false writes {@code 24.} for {@code 24.000}
 * @param comments       comment rules
 * @param radial         radial axis
 * @param axial          axial axis
 * @param swivel         swivel axis, when the control has one
 * @param shift          hob-shift axis, when the control has one
 * @param workWords      direction words of the work spindle
 * @param hobWords       direction words of the hob spindle
 * @param prologue       unnumbered lines before the program (e.g. {@code %})
 * @param epilogue       unnumbered lines after the program
 * @param templates      the templates, each one or more lines (an empty list writes no block)
 * @param lines          where things are in the dialect file, for findings
 */
public record Dialect(
        String name,
        String lineEnding,
        int maxLineLength,
        Optional<Numbering> numbering,
        NumberRange programNumbers,
        NumberRange toolStations,
        Decimals decimals,
        boolean trailingZeros,
        CommentRules comments,
        Axis radial,
        Axis axial,
        Optional<Axis> swivel,
        Optional<Axis> shift,
        Map<Rotation, String> workWords,
        Map<Rotation, String> hobWords,
        List<String> prologue,
        List<String> epilogue,
        Map<TemplateKey, List<LineTemplate>> templates,
        Lines lines) {

    public Dialect {
        workWords = Map.copyOf(workWords);
        hobWords = Map.copyOf(hobWords);
        prologue = List.copyOf(prologue);
        epilogue = List.copyOf(epilogue);
        templates = Map.copyOf(templates);
    }

    /**
     * Whole numbers the control takes, and the one used when the job gives none.
     *
     * @param dflt the default, within min and max
     * @param min  the smallest
     * @param max  the largest
     */
    public record NumberRange(long dflt, long min, long max) {
        /** True when the control takes this number. */
        public boolean takes(long n) {
            return n >= min && n <= max;
        }
    }

    /**
     * Line numbering.
     *
     * @param word  the address letter(s), e.g. {@code N}
     * @param start first number
     * @param step  increment
     */
    public record Numbering(String word, int start, int step) {
    }

    /**
     * Decimals written for each kind of value.
     *
     * @param mm       lengths in a metric program
     * @param inch     lengths in an inch program
     * @param mmPerRev feeds in a metric program
     * @param inPerRev feeds in an inch program
     * @param deg      angles
     * @param differential the helical addition, degrees per mm or per inch
     * @param s        times
     * @param rpm      spindle speeds
     */
    public record Decimals(int mm, int inch, int mmPerRev, int inPerRev, int deg, int differential, int s, int rpm) {
        /** Decimals of lengths in these units. */
        public int length(Units units) {
            return units == Units.MM ? mm : inch;
        }

        /** Decimals of feeds per revolution in these units. */
        public int feed(Units units) {
            return units == Units.MM ? mmPerRev : inPerRev;
        }
    }

    /**
     * How comment text is cleaned.
     *
     * @param upperCase true to write comments in capitals
     * @param forbidden characters replaced by a space (e.g. the comment delimiters)
     */
    public record CommentRules(boolean upperCase, String forbidden) {
    }

    /**
     * One axis.
     *
     * @param letter   address letter(s)
     * @param sign     +1 or −1: multiplies the value (e.g. −1 when the axis counts toward the chuck as negative)
     * @param diameter true when the radial axis is programmed as a diameter
     */
    public record Axis(String letter, int sign, boolean diameter) {
    }

    /**
     * Lines in the dialect file, for findings about templates.
     *
     * @param templates line of the {@code templates} object
     * @param each      line of each template present
     */
    public record Lines(int templates, Map<TemplateKey, Integer> each) {
        public Lines {
            each = Map.copyOf(each);
        }

        /** Line of a template, or of the templates object when the template is absent. */
        public int of(TemplateKey key) {
            return each.getOrDefault(key, templates);
        }
    }

    /** The template, when the dialect has it. */
    public Optional<List<LineTemplate>> template(TemplateKey key) {
        return Optional.ofNullable(templates.get(key));
    }
}
