package org.stasissheet.ui.entry;

import java.util.List;
import java.util.Objects;
import java.util.function.Function;
import javafx.beans.property.StringProperty;
import javafx.scene.control.ComboBox;
import javafx.scene.control.ListCell;

/**
 * Ties a picker to a text property holding a code, both ways. A code the picker does not offer (read from a file)
 * is added as an item of its own, so nothing read is lost or silently replaced. The picker gets the lean skin
 * ({@link LeanPickerSkin}): its closed list is not in the window.
 */
final class PickerBinding {
    private PickerBinding() {
    }

    static <T> void bind(ComboBox<T> box, StringProperty code, List<T> items, Function<T, String> codeOf,
                         Function<String, T> unknown, Function<T, String> shown, Function<T, String> listed) {
        Objects.requireNonNull(box, "box");
        box.getItems().setAll(items);
        box.setCellFactory(v -> cell(listed));
        box.setButtonCell(cell(shown));
        box.setSkin(new LeanPickerSkin<>(box, shown));
        Runnable fromModel = () -> {
            String c = code.get() == null ? "" : code.get();
            T item = box.getItems().stream().filter(i -> codeOf.apply(i).equals(c)).findFirst().orElse(null);
            if (item == null) {
                item = unknown.apply(c);
                box.getItems().add(item);
            }
            if (box.getValue() != item) {
                box.setValue(item);
            }
        };
        code.addListener(o -> fromModel.run());
        box.valueProperty().addListener((o, was, now) -> {
            if (now != null && !codeOf.apply(now).equals(code.get())) {
                code.set(codeOf.apply(now));
            }
        });
        fromModel.run();
    }

    private static <T> ListCell<T> cell(Function<T, String> shown) {
        return new ListCell<>() {
            @Override
            protected void updateItem(T item, boolean empty) {
                super.updateItem(item, empty);
                setText(empty || item == null ? null : shown.apply(item));
            }
        };
    }
}
