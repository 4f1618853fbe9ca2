package org.hobwright.wizard.store;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hobwright.api.check.Finding;
import org.hobwright.api.job.TemplateFields;
import org.hobwright.api.job.Units;
import tools.jackson.databind.node.ObjectNode;

/** Builds a {@link CycleTemplate} from a template file, checking its cycle values. */
final class TemplateReader {
    private TemplateReader() {
    }

    static Loaded<CycleTemplate> read(JsonDocument doc) {
        return FileFormat.TEMPLATE.open(doc).then(d -> {
            List<Finding> out = new ArrayList<>(FileFormat.TEMPLATE.structure(d));
            FieldReader f = FieldReader.root(d, out, Units.MM);
            Optional<Units> units = f.units("units");
            if (units.isEmpty()) {
                return Loaded.unreadable(out);
            }
            f = f.withUnits(units.get());
            String machine = f.text(TemplateFields.MACHINE).orElse("");
            String name = f.text(TemplateFields.NAME).orElse("");
            String description = f.text(TemplateFields.DESCRIPTION).orElse("");
            CycleReader.read(f.child("cycle"), false);
            if (Finding.anyError(out)) {
                return Loaded.failed(out);
            }
            ObjectNode cycle = d.root().get("cycle") instanceof ObjectNode c ? c : d.root().objectNode();
            return Loaded.of(new CycleTemplate(name, machine, description, units.get(), cycle), out);
        });
    }
}
