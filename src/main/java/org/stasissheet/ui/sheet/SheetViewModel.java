package org.stasissheet.ui.sheet;

import java.util.List;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import org.stasissheet.worksheet.Worksheet;

/** The view-model of the worksheet side: one read-only property holding everything it shows. */
public final class SheetViewModel {
    private final ReadOnlyObjectWrapper<SheetContent> content =
            new ReadOnlyObjectWrapper<>(this, "content", SheetContent.EMPTY);

    public ReadOnlyObjectProperty<SheetContent> contentProperty() {
        return content.getReadOnlyProperty();
    }

    public SheetContent content() {
        return content.get();
    }

    /** Shows a worksheet; {@code leftOut} names the fields it was computed without. */
    public void show(Worksheet ws, List<String> leftOut) {
        content.set(SheetContent.of(ws, leftOut));
    }

    /** No worksheet could be made; shows why. */
    public void showNothing(List<String> problems) {
        content.set(SheetContent.nothing(problems));
    }
}
