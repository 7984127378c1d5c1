package org.stasissheet.ui.labs;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import javafx.beans.property.ReadOnlyBooleanProperty;
import javafx.beans.property.ReadOnlyBooleanWrapper;
import org.stasissheet.labs.LabImport;
import org.stasissheet.labs.LabLine;
import org.stasissheet.measure.Numbers;
import org.stasissheet.ui.entry.EntryViewModel;
import org.stasissheet.ui.entry.FieldSpec;
import org.stasissheet.ui.entry.FormState;

/**
 * Puts accepted lab values into the form's fields (number and unit) and records where each came from under the
 * case's {@code extra}; undo puts back what those fields held before, and nothing else, so edits made since are
 * kept.
 */
public final class LabLanding {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private final EntryViewModel entry;
    private final ReadOnlyBooleanWrapper canUndo = new ReadOnlyBooleanWrapper(this, "canUndo", false);
    private Map<String, String> before = Map.of();
    private String unmappedBefore = "{}";

    public LabLanding(EntryViewModel entry) {
        this.entry = entry;
    }

    public ReadOnlyBooleanProperty canUndoProperty() {
        return canUndo.getReadOnlyProperty();
    }

    /** What the form holds now for an analyte, as "150 10*9/L"; empty when the field is empty. */
    public String current(org.stasissheet.measure.Analyte analyte) {
        FieldSpec spec = entry.field(path(analyte)).spec();
        FormState now = entry.snapshot();
        String text = now.get(spec.valueKey()).strip();
        return text.isEmpty() ? "" : text + " " + now.get(spec.unitKey());
    }

    private static String path(org.stasissheet.measure.Analyte analyte) {
        return (analyte.isBodyMeasure() ? "patient." : "labs.") + analyte.key();
    }

    /** Fills the fields of every taken value; returns how many fields changed. */
    public int land(LabImport accepted) {
        FormState now = entry.snapshot();
        Map<String, String> previous = new LinkedHashMap<>();
        FormState next = now;
        for (LabLine.Taken t : accepted.taken()) {
            FieldSpec spec = entry.field(path(t.analyte())).spec();
            previous.put(spec.valueKey(), now.get(spec.valueKey()));
            previous.put(spec.unitKey(), now.get(spec.unitKey()));
            next = next.with(spec.valueKey(), Numbers.plain(t.value().entered().value()))
                    .with(spec.unitKey(), t.value().entered().unit());
        }
        String unmapped = withExtra(now.unmappedJson(), accepted);
        entry.load(new FormState(next.values(), unmapped));
        before = previous;
        unmappedBefore = now.unmappedJson();
        canUndo.set(!previous.isEmpty());
        return accepted.taken().size();
    }

    /** Puts back what the imported fields held before the last import. */
    public void undo() {
        if (!canUndo.get()) {
            return;
        }
        FormState next = entry.snapshot();
        for (Map.Entry<String, String> e : before.entrySet()) {
            next = next.with(e.getKey(), e.getValue());
        }
        entry.load(new FormState(next.values(), unmappedBefore));
        before = Map.of();
        canUndo.set(false);
    }

    private static String withExtra(String unmappedJson, LabImport accepted) {
        try {
            JsonNode node = MAPPER.readTree(unmappedJson);
            ObjectNode root = node instanceof ObjectNode o ? o.deepCopy() : MAPPER.createObjectNode();
            String extra = Optional.ofNullable(root.get("extra")).map(JsonNode::toString).orElse("{}");
            root.set("extra", MAPPER.readTree(accepted.recordOrigins(extra)));
            return root.toString();
        } catch (JsonProcessingException e) {
            // the form's own unmapped JSON is always an object it wrote; keep it rather than lose it
            return unmappedJson;
        }
    }
}
