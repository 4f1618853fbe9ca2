package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.Units;
import tools.jackson.databind.node.ObjectNode;

/** Builds a {@link CycleTemplate} from a template file, checking its cycle values. */
final class TemplateReader {
    private TemplateReader() {
    }

    static Loaded<CycleTemplate> read(JsonDocument doc) {
        return FileFormat.TEMPLATE.open(doc).then(d -> {
            List<Finding> out = new ArrayList<>();
            FieldReader f = FieldReader.root(d, out, Units.MM);
            Optional<Units> units = f.units("units");
            if (units.isEmpty()) {
                return Loaded.unreadable(out);
            }
            f = f.withUnits(units.get());
            String machine = f.requiredText("machine", "name the machine profile this template belongs to").orElse("");
            String name = f.requiredText("name", "give the template a name").orElse("");
            boolean namesOk = !machine.isEmpty() && f.checkName("machine", machine)
                    & !name.isEmpty() && f.checkName("name", name);
            String description = f.text("description").orElse("");
            CycleReader.read(f.child("cycle"), false);
            if (!namesOk || Finding.anyError(out)) {
                return Loaded.failed(out);
            }
            ObjectNode cycle = d.root().get("cycle") instanceof ObjectNode c ? c : d.root().objectNode();
            return Loaded.of(new CycleTemplate(name, machine, description, units.get(), cycle), out);
        });
    }
}
