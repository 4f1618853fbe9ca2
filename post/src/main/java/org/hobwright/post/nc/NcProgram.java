package org.hobwright.post.nc;

import java.util.List;

/**
 * The program model: header comments, then the operations in order.
 *
 * @param ops the operations, start to end
 */
public record NcProgram(List<NcOp> ops) {
    public NcProgram {
        ops = List.copyOf(ops);
    }
}
