package org.hobwright.post.nc;

import org.hobwright.post.PostCode;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.HobJob;

/**
 * Turns the program model into blocks with the dialect's templates, words, decimals and line
 * numbers, and checks the dialect's line length.
 */
final class NcRenderer {

    private final Dialect d;
    private final HobJob job;

    NcRenderer(Dialect dialect, HobJob job) {
        this.d = dialect;
        this.job = job;
    }

    /**
     * The rendered program.
     *
     * @param lines    the program's lines, without line endings
     * @param findings errors (a line longer than the dialect allows)
     */
    record Rendered(List<String> lines, List<Finding> findings) {
    }

    /** A content line before numbering, with the template it came from. */
    private record Block(String text, TemplateKey from) {
    }

    Rendered render(List<PostedOp> program) {
        List<Block> first = blocks(program, 100_000);
        List<Block> blocks = blocks(program, first.size());
        List<String> out = new ArrayList<>(d.prologue());
        List<Finding> findings = new ArrayList<>();
        int n = d.numbering().map(Dialect.Numbering::start).orElse(0);
        for (Block b : blocks) {
            String line = b.text();
            if (d.numbering().isPresent()) {
                line = d.numbering().get().word() + n + " " + line;
                n += d.numbering().get().step();
            }
            if (line.length() > d.maxLineLength()) {
                findings.add(PostCode.NC_LINE_TOO_LONG.at("dialect.templates." + b.from().key(),
                        d.name() + " line " + d.lines().of(b.from()) + ": template \"" + b.from().key()
                                + "\" gives a block of " + line.length() + " characters, the dialect allows "
                                + d.maxLineLength() + ": " + line,
                        "shorten the template or raise maxLineLength to what the control accepts"));
            }
            out.add(line);
        }
        out.addAll(d.epilogue());
        return new Rendered(out, findings);
    }

    private List<Block> blocks(List<PostedOp> program, int lineCountBound) {
        int numberWidth = d.numbering().map(nb -> nb.word().length()
                + String.valueOf(nb.start() + (long) nb.step() * lineCountBound).length() + 1).orElse(0);
        List<Block> out = new ArrayList<>();
        for (PostedOp posted : program) {
            NcOp op = posted.op();
            if (op instanceof NcOp.Remark r) {
                comment(r.text(), numberWidth, out);
            } else {
                Map<Placeholder, String> values = values(posted);
                if (op instanceof NcOp.Synchronise) {
                    add(TemplateKey.WORK_SPINDLE, values, out);
                }
                add(key(op), values, out);
            }
        }
        return out;
    }

    private void add(TemplateKey key, Map<Placeholder, String> values, List<Block> out) {
        for (LineTemplate t : d.template(key).orElseThrow()) {
            out.add(new Block(t.render(values), key));
        }
    }

    private void comment(String text, int numberWidth, List<Block> out) {
        String clean = CommentText.clean(text, d.comments());
        List<LineTemplate> templates = d.template(TemplateKey.COMMENT).orElseThrow();
        int overhead = templates.stream().mapToInt(t -> t.render(Map.of(Placeholder.TEXT, "")).length())
                .max().orElse(0);
        for (String piece : CommentText.wrap(clean, d.maxLineLength() - overhead - numberWidth)) {
            for (LineTemplate t : templates) {
                out.add(new Block(t.render(Map.of(Placeholder.TEXT, piece)), TemplateKey.COMMENT));
            }
        }
    }

    private TemplateKey key(NcOp op) {
        if (op instanceof NcOp.Fixed f) {
            return f.key();
        } else if (op instanceof NcOp.Safe safe) {
            return safe.key();
        } else if (op instanceof NcOp.Synchronise s) {
            return s.helical() ? TemplateKey.SYNC_ON_HELIX : TemplateKey.SYNC_ON;
        } else if (op instanceof NcOp.Wait) {
            return TemplateKey.DWELL;
        } else if (op instanceof NcOp.SwivelTo) {
            return TemplateKey.SWIVEL_TO;
        } else if (op instanceof NcOp.ShiftTo) {
            return TemplateKey.HOB_SHIFT;
        } else if (op instanceof NcOp.Move m) {
            return m.rapid() ? TemplateKey.RAPID : TemplateKey.FEED_MOVE;
        }
        throw new IllegalArgumentException("no template for " + op);
    }

    private Map<Placeholder, String> values(PostedOp posted) {
        NcOp op = posted.op();
        Map<Placeholder, String> v = new EnumMap<>(Placeholder.class);
        JobNumbers numbers = JobNumbers.of(job, d);
        v.put(Placeholder.PROGRAM_NUMBER, String.valueOf(numbers.programNumber()));
        v.put(Placeholder.TOOL, String.valueOf(numbers.toolStation()));
        v.put(Placeholder.PROGRAM_NAME, CommentText.clean(job.name(), d.comments()));
        posted.numbers().forEach((p, n) -> v.put(p, n.text(d.trailingZeros())));
        if (op instanceof NcOp.Synchronise s) {
            v.put(Placeholder.HOB_TURNS, String.valueOf(s.sync().hobTurns()));
            v.put(Placeholder.WORK_TURNS, String.valueOf(s.sync().workTurns()));
            v.put(Placeholder.HOB_DIR, d.hobWords().get(s.sync().hobRotation()));
            v.put(Placeholder.WORK_DIR, d.workWords().get(s.workRotation()));
        } else if (op instanceof NcOp.SwivelTo) {
            v.put(Placeholder.SWIVEL, d.swivel().orElseThrow().letter() + v.get(Placeholder.SWIVEL));
        } else if (op instanceof NcOp.ShiftTo) {
            v.put(Placeholder.SHIFT, d.shift().orElseThrow().letter() + v.get(Placeholder.SHIFT));
        } else if (op instanceof NcOp.Safe) {
            v.put(Placeholder.SAFE_RADIAL, d.radial().letter() + v.get(Placeholder.SAFE_RADIAL));
        } else if (op instanceof NcOp.Move) {
            v.put(Placeholder.RADIAL, d.radial().letter() + v.get(Placeholder.RADIAL));
            v.put(Placeholder.AXIAL, d.axial().letter() + v.get(Placeholder.AXIAL));
        }
        return v;
    }
}
