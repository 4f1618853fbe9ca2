package org.hobwright.wizard.cli;

import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.text.JsonTrees;
import org.hobwright.wizard.run.Outputs;
import tools.jackson.databind.node.ArrayNode;
import tools.jackson.databind.node.JsonNodeFactory;
import tools.jackson.databind.node.ObjectNode;

/**
 * What {@code plan --json} prints: the report writer's text for each job that could be read
 * (also when it has errors: then with its error findings and without the parts that could not be
 * computed). A job whose values do not make a job, or whose report the writer refuses, gets a
 * small object with the job's source and its {@code /findings}. Several jobs: a JSON array.
 */
final class JsonReports {
    private final Outputs outputs;

    JsonReports(Outputs outputs) {
        this.outputs = outputs;
    }

    String of(List<JobInput> jobs) {
        List<String> texts = jobs.stream().map(this::one).toList();
        if (texts.size() == 1) {
            return texts.get(0).strip();
        }
        return "[\n" + String.join(",\n", texts.stream().map(String::strip).toList()) + "\n]";
    }

    private String one(JobInput in) {
        Optional<String> report = in.job().flatMap(j -> in.cycle().flatMap(c -> outputs.report(j, c)));
        return report.orElseGet(() -> findingsOnly(in));
    }

    private static String findingsOnly(JobInput in) {
        JsonNodeFactory nodes = JsonNodeFactory.instance;
        ObjectNode root = nodes.objectNode();
        root.put("source", in.source());
        ArrayNode list = root.putArray("findings");
        for (Finding f : in.allFindings()) {
            ObjectNode o = list.addObject();
            o.put("severity", f.severity().word());
            o.put("code", f.code());
            o.put("field", f.field());
            o.put("message", f.message());
            f.fix().ifPresent(x -> o.put("fix", x));
        }
        return JsonTrees.write(root, JsonTrees.Layout.DEFAULT);
    }
}
