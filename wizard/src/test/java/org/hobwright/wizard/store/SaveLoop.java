package org.hobwright.wizard.store;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Optional;

/**
 * A second process for the store tests, started with the test class path.
 *
 * <p>{@code replace} and {@code create} first print {@code ready} and wait for {@code HOME/go}.
 *
 * <ul>
 *   <li>{@code replace HOME NAME TAG COUNT}: saves machine NAME COUNT times with --force, each
 *       time with a description ending in TAG and the round;</li>
 *   <li>{@code create HOME PREFIX COUNT}: tries to save PREFIX-0 .. PREFIX-(COUNT-1) without
 *       --force and prints {@code saved NAME} for each one it created;</li>
 *   <li>{@code stall TARGET}: starts an atomic write of TARGET, writes half of it, prints
 *       {@code writing} and waits to be killed.</li>
 * </ul>
 */
public final class SaveLoop {
    private SaveLoop() {
    }

    public static void main(String[] args) throws Exception {
        if (!args[0].equals("stall")) {
            awaitStart(Path.of(args[1]));
        }
        switch (args[0]) {
            case "replace" -> replace(Path.of(args[1]), args[2], args[3], Integer.parseInt(args[4]));
            case "create" -> create(Path.of(args[1]), args[2], Integer.parseInt(args[3]));
            case "stall" -> stall(Path.of(args[1]));
            default -> throw new IllegalArgumentException(args[0]);
        }
    }

    /** Says {@code ready} and waits for the file {@code HOME/go}, so that both processes start saving together. */
    private static void awaitStart(Path home) throws InterruptedException {
        System.out.println("ready");
        System.out.flush();
        Path go = home.resolve(GO);
        long deadline = System.nanoTime() + 60_000_000_000L;
        while (!Files.exists(go) && System.nanoTime() < deadline) {
            Thread.sleep(1);
        }
    }

    /** The file whose appearance starts the second process's saves. */
    static final String GO = "go";

    static MachineFile machine(String name, String description) {
        return new MachineFile(SampleProfile.profile(name), org.hobwright.api.job.Units.MM, description);
    }

    static void replace(Path home, String name, String tag, int count) {
        Library lib = Library.open(Optional.of(home));
        for (int i = 0; i < count; i++) {
            Loaded<Path> saved = lib.saveMachine(machine(name, "round " + i + " by " + tag), true);
            if (!saved.ok()) {
                System.out.println("failed " + saved.errorLine());
            }
        }
        System.out.println("done");
    }

    static void create(Path home, String prefix, int count) {
        Library lib = Library.open(Optional.of(home));
        for (int i = 0; i < count; i++) {
            if (lib.saveMachine(machine(prefix + "-" + i, "by " + ProcessHandle.current().pid()), false).ok()) {
                System.out.println("saved " + prefix + "-" + i);
            }
        }
        System.out.println("done");
    }

    static void stall(Path target) throws IOException {
        AtomicFiles.write(target, (OutputStream out) -> {
            out.write("{\n  \"format\": \"hobwright-machine\",\n".getBytes(StandardCharsets.UTF_8));
            out.flush();
            System.out.println("writing");
            System.out.flush();
            try {
                Thread.sleep(60_000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, true);
        Files.writeString(target.resolveSibling("not-killed"), "the write finished");
    }

    /** A fixed valid profile (the Varrow sample's values, renamed). */
    static final class SampleProfile {
        private SampleProfile() {
        }

        static org.hobwright.api.job.MachineProfile profile(String name) {
            org.hobwright.api.job.MachineProfile p = Library.readMachineFile(StoreTesting.SCENARIO
                    .resolve("machines/varrow-1605.json")).get().profile();
            return new org.hobwright.api.job.MachineProfile(name, p.dialect(), p.workMinRpm(), p.workMaxRpm(),
                    p.hobMinRpm(), p.hobMaxRpm(), p.maxSyncRatio(), p.followsHelix(), p.swivel(), p.radialMinMm(),
                    p.radialMaxMm(), p.axialMinMm(), p.axialMaxMm(), p.hobShiftTravelMm(), p.rapidMmPerMin(),
                    p.maxFeedMmPerMin(), p.syncSettleS(), p.maxHobDiameterMm());
        }
    }
}
