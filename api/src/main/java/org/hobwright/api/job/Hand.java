package org.hobwright.api.job;

import org.hobwright.api.ApiStatus;

/** Hand of a helix or of a hob thread. Right hand counts positive in signed angles. */
@ApiStatus(since = "1.0")
public enum Hand {
    /** Right hand: the helix advances away from the viewer when turned clockwise. */
    RIGHT(1),
    /** Left hand. */
    LEFT(-1);

    private final int sign;

    Hand(int sign) {
        this.sign = sign;
    }

    /** {@return +1 for right hand, -1 for left hand} */
    public int sign() {
        return sign;
    }

    /** {@return the word used in job files: {@code right} or {@code left}} */
    public String word() {
        return name().toLowerCase(java.util.Locale.ROOT);
    }

    /** {@return the opposite hand} */
    public Hand opposite() {
        return this == RIGHT ? LEFT : RIGHT;
    }

    /**
     * Reads {@code right} or {@code left}.
     *
     * @throws IllegalArgumentException naming the word otherwise
     * @param word word
     * @return reads {@code right} or {@code left}
     */
    public static Hand fromWord(String word) {
        for (Hand h : values()) {
            if (h.word().equals(word)) {
                return h;
            }
        }
        throw new IllegalArgumentException("hand must be \"right\" or \"left\", was \"" + word + "\"");
    }
}
