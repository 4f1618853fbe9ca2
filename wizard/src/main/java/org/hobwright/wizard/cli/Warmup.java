package org.hobwright.wizard.cli;

import java.text.DateFormatSymbols;
import java.util.GregorianCalendar;
import java.util.Locale;
import java.util.TimeZone;

/**
 * Start-up: loads, on a second core, the JDK's time-zone and calendar data that the JSON mapper's
 * default date format initialises when the first mapper is built, so that this happens while the
 * main thread parses arguments and opens the library. Measured with
 * {@code wizard/src/bench/startup.sh}: about 25 ms less in the job-reading phase on two cores.
 * Harmless when the data is never needed: the thread is a daemon and changes nothing.
 */
final class Warmup {
    private Warmup() {
    }

    /** Starts the warm-up thread. */
    static void start() {
        Thread t = new Thread(() -> {
            TimeZone utc = TimeZone.getTimeZone("UTC");
            new GregorianCalendar(utc, Locale.US);
            DateFormatSymbols.getInstance(Locale.US);
        }, "hobwright-warmup");
        t.setDaemon(true);
        t.start();
    }
}
