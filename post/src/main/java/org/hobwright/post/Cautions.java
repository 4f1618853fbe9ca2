package org.hobwright.post;

import java.util.List;

/**
 * The cautions printed in every program and on every setup sheet: hobbing drives a rotating,
 * sharp cutter and two spindles locked together by the control.
 */
public final class Cautions {
    private Cautions() {
    }

    /** The cautions, one sentence each, plain ASCII. */
    public static final List<String> LINES = List.of(
            "Caution: rotating multi-tooth cutter and synchronised spindles.",
            "Keep the guards closed and never reach into the working area while the spindles are locked together.",
            "Prove the program out in single block at reduced feed and speed override before the first part.",
            "Check every word of this program against the machine builder's and control builder's manuals.",
            "Follow the machine builder's manual, local codes and your shop's licensed practice.",
            "Cutting data are typical values: confirm them with the hob supplier.");
}
