// A job from JSON text, a machine fetched from the library by name, the cutting data the planner
// uses, a job with an error and its findings one per line, and the wizard started blank.
// From the top folder of a checkout, after `mvn -B -q -DskipTests package`:
//   jshell --class-path api/target/hobwright-api-0.2.0.jar:wizard/target/hobwright-plugin.jar samples/scripts/job-from-json.jsh
import java.nio.file.Files;
import org.hobwright.api.Hobwright;
import org.hobwright.api.check.Finding;

var hw = Hobwright.open(Files.createTempDirectory("hobwright-library"));
System.out.println("machines: " + hw.library().machines());
var lathe = hw.library().machine("ottmere-4008").orElseThrow();
System.out.println("ottmere-4008 follows a helix: " + lathe.followsHelix());
System.out.println(hw.library().cuttingData("steel-free-machining", "hss-coated").orElseThrow());

var json = """
    {
      "format": "hobwright-job", "version": 1, "name": "script-helical", "units": "mm",
      "gear": { "partName": "script gear", "teeth": 30, "module": 0.8, "pressureAngle": 20,
                "helixAngle": 15, "hand": "right", "faceWidth": 6, "profileShift": 0,
                "thicknessAllowance": -0.02, "toothSystem": "iso53-a", "toleranceClass": 8 },
      "hob": { "module": 0.8, "pressureAngle": 20, "starts": 1, "hand": "right",
               "outsideDiameter": 25, "gashes": 12, "length": 25, "material": "hss-coated" },
      "machine": "ottmere-4008",
      "cycle": { "workMaterial": "steel-free-machining" }
    }
    """;
var job = hw.readJob(json, "script").orElseThrow();
var planned = hw.plan(job);
System.out.println(planned);
if (planned.hasErrors()) {
    throw new IllegalStateException(planned.toString());
}

// the same gear on the lathe whose control cannot follow a helix: refused, with the reason
var refused = hw.plan(job.withMachine(hw.library().machine("varrow-1605").orElseThrow()));
System.out.println(Finding.lines(refused.findings()));
if (!refused.hasErrors()) {
    throw new IllegalStateException("a helical gear on a spur-only lathe must be refused");
}

// a host's wizard starts blank: no sample part name, tooth count or machine
var wizard = hw.wizard();
System.out.println(wizard.view().id() + ", teeth empty: " + wizard.value("gear.teeth").isEmpty());
if (!wizard.value("name").isEmpty() || !wizard.value("gear.teeth").isEmpty() || !wizard.value("machine").isEmpty()) {
    throw new IllegalStateException("the wizard should start blank");
}
hw.close();
/exit
