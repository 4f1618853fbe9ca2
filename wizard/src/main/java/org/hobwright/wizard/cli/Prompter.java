package org.hobwright.wizard.cli;

import org.hobwright.api.check.Finding;
import java.io.BufferedReader;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.util.Optional;
import org.hobwright.text.JsonTrees;

/**
 * Asks questions on a terminal or on piped input. When the input is piped the answer is echoed,
 * so a transcript reads like a session at the keyboard.
 */
final class Prompter {
    private final BufferedReader in;
    private final PrintWriter out;
    private final boolean echo;

    /**
     * @param in   where answers come from
     * @param out  where questions go
     * @param echo true to print each answer after its question (piped input)
     */
    Prompter(BufferedReader in, PrintWriter out, boolean echo) {
        this.in = in;
        this.out = out;
        this.echo = echo;
    }

    /** The writer questions go to. */
    PrintWriter writer() {
        return out;
    }

    /** Prints a line. */
    void say(String line) {
        out.println(Finding.printable(line));
    }

    /**
     * Asks and reads one line.
     *
     * @return the answer, stripped (of a byte-order mark too, which an answers file may start with),
     *         or empty when the input has ended
     */
    Optional<String> ask(String prompt) {
        out.print(Finding.printable(prompt));
        out.flush();
        try {
            String line = in.readLine();
            if (echo || line == null) {
                out.println(line == null ? "" : Finding.printable(line));
            }
            return Optional.ofNullable(line).map(l -> JsonTrees.withoutByteOrderMark(l).strip());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
