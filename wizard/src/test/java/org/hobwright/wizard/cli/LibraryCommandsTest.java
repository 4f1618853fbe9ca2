package org.hobwright.wizard.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class LibraryCommandsTest {
    @TempDir
    Path home;

    private Path machineFile(String name) throws IOException {
        String text = Store.builtinText("machines/varrow-1605.json").replace("\"varrow-1605\"", "\"" + name + "\"");
        return Files.writeString(home.resolve(name + "-file.json"), text);
    }

    @Test
    void builtInMachinesAreListedAndShown() {
        Cli.Run list = Cli.run(home, "machines", "list");
        assertEquals(ExitCodes.OK, list.code(), list::toString);
        assertTrue(list.out().contains("varrow-1605  (built-in)"), list::toString);
        assertTrue(list.out().contains("ottmere-4008  (built-in)"), list::toString);
        Cli.Run show = Cli.run(home, "machines", "show", "varrow-1605");
        assertEquals(ExitCodes.OK, show.code(), show::toString);
        assertTrue(show.out().contains("\"hobwright-machine\""), show::toString);
    }

    @Test
    void aMachineIsSavedReplacedOnlyWithForceAndRemoved() throws IOException {
        Path file = machineFile("shop-lathe-2");
        Cli.Run saved = Cli.run(home, "machines", "save", file.toString());
        assertEquals(ExitCodes.OK, saved.code(), saved::toString);
        assertTrue(Files.exists(home.resolve("machines/shop-lathe-2.json")));
        Cli.Run again = Cli.run(home, "machines", "save", file.toString());
        assertEquals(ExitCodes.USAGE, again.code(), again::toString);
        assertTrue(again.err().contains("shop-lathe-2"), again::toString);
        assertEquals(ExitCodes.OK, Cli.run(home, "machines", "save", file.toString(), "--force").code());
        assertTrue(Cli.run(home, "machines", "list").out().contains("shop-lathe-2  (saved)"));
        assertEquals(ExitCodes.OK, Cli.run(home, "machines", "remove", "shop-lathe-2").code());
        assertTrue(Files.notExists(home.resolve("machines/shop-lathe-2.json")));
    }

    @Test
    void theHomeOptionWinsOverTheEnvironment() throws IOException {
        Path other = Files.createDirectory(home.resolve("other"));
        Path file = machineFile("shop-lathe-3");
        assertEquals(ExitCodes.OK, Cli.run(home, "--home", other.toString(), "machines", "save", file.toString())
                .code());
        assertTrue(Files.exists(other.resolve("machines/shop-lathe-3.json")));
        assertEquals(ExitCodes.OK, Cli.run(home, "machines", "save", "--home", other.toString(), file.toString(),
                "--force").code());
    }

    @Test
    void builtInMachinesCannotBeRemovedAndBadNamesAreRefused() {
        Cli.Run r = Cli.run(home, "machines", "remove", "varrow-1605");
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        Cli.Run bad = Cli.run(home, "machines", "show", "../x");
        assertEquals(ExitCodes.USAGE, bad.code(), bad::toString);
        assertEquals(1, bad.err().lines().count(), bad::toString);
    }

    @Test
    void templatesNeedTheirMachine() {
        Cli.Run r = Cli.run(home, "templates", "show", "brass-fine");
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().contains("--machine"), r::toString);
        assertEquals(ExitCodes.OK, Cli.run(home, "templates", "list").code());
    }

    @Test
    void machinesWithoutAnActionIsAUsageError() {
        assertEquals(ExitCodes.USAGE, Cli.run(home, "machines").code());
    }

    /** A machine naming a dialect the library does not have is refused on save, not when planning. */
    @Test
    void aMachineWhoseDialectIsMissingIsRefused() throws IOException {
        Path file = Files.writeString(home.resolve("m.json"), Store.builtinText("machines/varrow-1605.json")
                .replace("\"varrow-1605\"", "\"shop-lathe-4\"").replace("\"varrow-ctl\"", "\"no-such-ctl\""));
        Cli.Run r = Cli.run(home, "machines", "save", file.toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().contains("dialect \"no-such-ctl\", which is not in the library (it has ottmere-ctl,"
                + " varrow-ctl)"), r::toString);
        assertTrue(r.err().contains("hobwright dialects save FILE"), r::toString);
        assertTrue(Files.notExists(home.resolve("machines/shop-lathe-4.json")));
    }

    /** A template for a machine the library does not have is refused on save. */
    @Test
    void aTemplateForAMissingMachineIsRefused() throws IOException {
        Path file = Files.writeString(home.resolve("t.json"), Store.builtinText("templates/varrow-1605/brass-fine.json")
                .replace("\"varrow-1605\"", "\"no-such-lathe\""));
        Cli.Run r = Cli.run(home, "templates", "save", file.toString());
        assertEquals(ExitCodes.USAGE, r.code(), r::toString);
        assertTrue(r.err().contains("machine \"no-such-lathe\", which is not in the library"), r::toString);
        assertTrue(Files.notExists(home.resolve("templates/no-such-lathe")));
    }

    /**
     * The dialects verb lists, shows, saves and removes; a dialect is checked on save by posting the
     * sample job with it, and a machine may name it once saved.
     */
    @Test
    void dialectsAreListedShownCheckedSavedAndRemoved() throws IOException {
        Cli.Run list = Cli.run(home, "dialects", "list");
        assertEquals(ExitCodes.OK, list.code(), list::toString);
        assertTrue(list.out().contains("varrow-ctl  (built-in)"), list::toString);
        assertTrue(Cli.run(home, "dialects", "show", "varrow-ctl").out().contains("\"hobwright-dialect\""));

        String good = Store.builtinText("dialects/varrow-ctl.json").replace("\"varrow-ctl\"", "\"shop-ctl\"");
        String broken = good.replace("F{feed}", "F{feedrate}");
        Path bad = Files.writeString(home.resolve("broken.json"), broken);
        Cli.Run refused = Cli.run(home, "dialects", "save", bad.toString());
        assertEquals(ExitCodes.USAGE, refused.code(), refused::toString);
        assertTrue(refused.err().contains("feedrate"), refused::toString);
        assertTrue(Files.notExists(home.resolve("dialects/shop-ctl.json")));

        Path file = Files.writeString(home.resolve("shop.json"), good);
        Cli.Run saved = Cli.run(home, "dialects", "save", file.toString());
        assertEquals(ExitCodes.OK, saved.code(), saved::toString);
        assertTrue(Files.exists(home.resolve("dialects/shop-ctl.json")));
        Path machine = Files.writeString(home.resolve("m.json"), Store.builtinText("machines/varrow-1605.json")
                .replace("\"varrow-1605\"", "\"shop-lathe-5\"").replace("\"varrow-ctl\"", "\"shop-ctl\""));
        assertEquals(ExitCodes.OK, Cli.run(home, "machines", "save", machine.toString()).code());
        assertEquals(ExitCodes.OK, Cli.run(home, "dialects", "remove", "shop-ctl").code());
        assertTrue(Files.notExists(home.resolve("dialects/shop-ctl.json")));
        assertEquals(ExitCodes.USAGE, Cli.run(home, "dialects", "remove", "varrow-ctl").code(), "built-in");
    }
}
