package org.hobwright.wizard.cli;

/** Entry point of the terminal tool. The only place that calls {@link System#exit}. */
public final class Main {
    private Main() {
    }

    /**
     * Runs the tool and exits with its code: 0 done, 1 the job has errors, 2 usage or input problem.
     *
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        System.exit(HobwrightCommand.run(args));
    }
}
