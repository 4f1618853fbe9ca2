// Plans a sample gear through the façade, changes one value, plans again and writes the outputs.
// From the top folder of a checkout, after `mvn -B -q -DskipTests package`:
//   jshell --class-path api/target/hobwright-api-0.2.0.jar:wizard/target/hobwright-plugin.jar samples/scripts/plan-change-write.jsh
// (on Windows use ; between the two jars). Every program Hobwright writes is a starting point to be
// proved out on the machine: see the cautions in README.md.
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import org.hobwright.api.Hobwright;

var scenario = Path.of(System.getProperty("hobwright.samples", "samples/scenario"));
// an empty library of our own: only the built-in machines, templates and cutting data
var hw = Hobwright.open(Files.createTempDirectory("hobwright-library"));

var job = hw.readJob(scenario.resolve("jobs/metering-pump-gear.json")).orElseThrow();
var planned = hw.plan(job);
System.out.println(planned);

// one value changed: the same gear twice as wide takes longer to cut
var wider = hw.plan(job.withGear(job.gear().withFaceWidthMm(2 * job.gear().faceWidthMm())));
System.out.println(wider);
if (wider.cycle().summary().orElseThrow().cycleTimeS() <= planned.cycle().summary().orElseThrow().cycleTimeS()) {
    throw new IllegalStateException("the wider gear should take longer");
}

var written = hw.write(wider, Files.createTempDirectory("hobwright-out"), LocalDate.of(2026, 12, 1));
System.out.println(written);
if (!written.ok()) {
    throw new IllegalStateException(written.toString());
}
hw.close();
/exit
