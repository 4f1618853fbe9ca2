package org.hobwright.wizard.steps;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.cycle.HobCycle;
import org.hobwright.api.job.HobJob;
import org.hobwright.api.job.Units;
import tools.jackson.databind.node.ObjectNode;

/**
 * What the step model needs from the rest of Hobwright: reading a job tree, the job checks, the
 * planner and the names in the machine and template library. Kept to an interface so a session
 * can be tested without a library folder.
 */
public interface StepServices {

    /**
     * The outcome of reading a job tree.
     *
     * @param job      the job, when it could be read
     * @param findings every problem met while reading
     */
    record JobRead(Optional<HobJob> job, List<Finding> findings) {
        public JobRead {
            findings = List.copyOf(findings);
        }
    }

    /** Reads a job file's tree (machine and template names resolved through the library). */
    JobRead read(ObjectNode tree);

    /** The engineering checks of a readable job. */
    List<Finding> check(HobJob job);

    /** Plans a readable job. */
    HobCycle plan(HobJob job);

    /** Names of the saved and built-in machine profiles. */
    List<String> machines();

    /** Names of the saved and built-in cycle templates of a machine. */
    List<String> templates(String machine);

    /**
     * The cycle keys of a template of a machine, converted to {@code units}; empty when there is
     * no such template (a session without a library has none).
     */
    default Optional<ObjectNode> templateCycle(String machine, String name, Units units) {
        return Optional.empty();
    }
}
