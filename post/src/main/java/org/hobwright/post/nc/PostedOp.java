package org.hobwright.post.nc;

import org.hobwright.text.Scaled;
import java.util.Map;

/**
 * One operation of the program with its numbers exactly as the program writes them: in the job's
 * unit, the radial axis as a diameter or a radius, signed as the axes count, rounded to the
 * dialect's decimals. The safety check reads these numbers, and the renderer writes them.
 *
 * @param op      the operation of the program model
 * @param numbers the posted number of each numeric placeholder the operation fills
 */
record PostedOp(NcOp op, Map<Placeholder, Scaled> numbers) {
    PostedOp {
        numbers = Map.copyOf(numbers);
    }

    /** The posted number of a placeholder. */
    Scaled number(Placeholder p) {
        Scaled n = numbers.get(p);
        if (n == null) {
            throw new IllegalArgumentException("operation " + op + " posts no {" + p.key() + "}");
        }
        return n;
    }
}
