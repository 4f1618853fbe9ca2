package org.hobwright.wizard.steps;

import org.hobwright.api.job.FieldDef;
import org.hobwright.api.job.JobFields;
import org.hobwright.api.job.Units;
import org.hobwright.wizard.geometry.ToothSystem;
import tools.jackson.databind.JsonNode;
import tools.jackson.databind.node.ObjectNode;

/**
 * Answers the step model proposes from other answers: the tooth system that goes with the pitch
 * ({@link ToothSystem#forPitch}) and the cycle values of a chosen template. A proposal replaces only
 * an empty answer or an earlier proposal, never a value the user typed.
 */
final class Proposals {
    private static final String SYSTEM = JobFields.GEAR_TOOTH_SYSTEM.key();

    /** The tooth system last proposed (empty when none was). */
    private String proposedSystem = "";

    /** The tooth system the gear's pitch answers call for; empty while no pitch is answered. */
    static String toothSystem(Answers answers) {
        Double dp = FieldCheck.number(answers.get(JobFields.GEAR_DIAMETRAL_PITCH.key())).orElse(null);
        Double m = FieldCheck.number(answers.get(JobFields.GEAR_MODULE.key())).orElse(null);
        if (dp != null && m == null) {
            return ToothSystem.forDiametralPitch(dp);
        }
        return m != null ? ToothSystem.FOR_MODULE : "";
    }

    /** Proposes the tooth system for the pitch when it is still unanswered or still an earlier proposal. */
    void followPitch(Answers answers) {
        String now = answers.get(SYSTEM);
        String proposal = toothSystem(answers);
        if (!proposal.isEmpty() && (now.isEmpty() || now.equals(proposedSystem))) {
            answers.put(SYSTEM, proposal);
            proposedSystem = proposal;
        }
    }

    /**
     * Applies a template to the cycle answers: each cycle field takes the template's value, or the
     * table's default when the template leaves it out, so no earlier answer remains unseen.
     *
     * @param cycle the template's cycle keys in the job's units
     */
    static void applyTemplate(Answers answers, ObjectNode cycle, Units units) {
        for (FieldDef f : JobFields.cycle()) {
            JsonNode v = cycle;
            String[] parts = f.key().split("\\.");
            for (int i = 1; i < parts.length && v != null; i++) {
                v = v.get(parts[i]);
            }
            answers.put(f.key(), v == null || v.isNull() ? f.dflt().value(units) : Answers.text(v));
        }
    }
}
