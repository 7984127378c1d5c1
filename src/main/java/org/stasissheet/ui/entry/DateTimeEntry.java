package org.stasissheet.ui.entry;

import java.time.Clock;
import java.time.LocalDate;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.Optional;
import javafx.beans.property.ReadOnlyStringWrapper;
import javafx.scene.Node;
import javafx.scene.control.Button;
import javafx.scene.control.DatePicker;
import javafx.scene.control.Label;
import javafx.scene.control.TextField;
import javafx.scene.control.Tooltip;
import javafx.scene.layout.HBox;
import javafx.util.StringConverter;

/**
 * The time of the assessment: a date picker and a 24-hour time field ({@code #assessedAt-date},
 * {@code #assessedAt-time}) that together write the field's ISO date-time ({@link AssessedTime}), a "now" button,
 * and a message under them ({@code #assessedAt-time-message}) naming the field and the value when a time is
 * refused. The date is typed and shown as YYYY-MM-DD whatever the computer's language, so day and month are
 * never swapped.
 */
final class DateTimeEntry {
    private static final DateTimeFormatter ISO_DATE = DateTimeFormatter.ISO_LOCAL_DATE;

    private final FieldModel field;
    private final Clock clock;
    private final DatePicker date = new DatePicker();
    private final TextField time = new TextField();
    private final Button now = new Button("now");
    private final ReadOnlyStringWrapper problem = new ReadOnlyStringWrapper(this, "problem", "");
    private final Label message = new Label();
    private boolean syncing;

    DateTimeEntry(FieldModel field, Clock clock) {
        this.field = field;
        this.clock = clock;
        String id = field.spec().id();
        date.setId(id + "-date");
        date.setAccessibleText(field.spec().label() + ": date");
        date.setPromptText("YYYY-MM-DD");
        date.setConverter(isoDates());
        date.setPrefWidth(150);
        date.setTooltip(new Tooltip("The date, as YYYY-MM-DD; Alt+Down opens the calendar"));
        time.setId(id + "-time");
        time.setAccessibleText(field.spec().label() + ": time of day, HH:mm, 24-hour");
        time.setPromptText("HH:mm");
        time.setPrefColumnCount(6);
        time.setTooltip(new Tooltip("The time of day, HH:mm, 24-hour (02:40, 14:05)"));
        time.getStyleClass().add("text-input-field");
        now.setId(id + "-now");
        now.setAccessibleText("Set " + field.spec().label() + " to the current date and time");
        now.setOnAction(e -> field.textProperty().set(AssessedTime.now(clock)));
        message.setId(id + "-time-message");
        message.getStyleClass().add("field-problem");
        message.setWrapText(true);
        message.textProperty().bind(problem.getReadOnlyProperty());
        message.visibleProperty().bind(problem.isNotEmpty());
        message.managedProperty().bind(message.visibleProperty());

        show(field.textProperty().get());
        field.textProperty().addListener((o, was, text) -> {
            if (!syncing) {
                show(text);
            }
        });
        date.valueProperty().addListener((o, was, d) -> write());
        time.textProperty().addListener((o, was, t) -> write());
    }

    DatePicker date() {
        return date;
    }

    TextField time() {
        return time;
    }

    Button nowButton() {
        return now;
    }

    Node inputs() {
        return new HBox(6, date, time);
    }

    Label message() {
        return message;
    }

    /** Shows a recorded value (read from a file, a draft, the "now" button) without writing it back. */
    private void show(String recorded) {
        AssessedTime.Shown shown = AssessedTime.show(recorded);
        syncing = true;
        try {
            date.setValue(shown.date().orElse(null));
            time.setText(shown.time());
        } finally {
            syncing = false;
        }
        problem.set(AssessedTime.twiceNote(recorded, clock.getZone()));
    }

    /** The date and time as typed now, written into the field (a refused time too, with its message). */
    private void write() {
        if (syncing) {
            return;
        }
        AssessedTime.Written w = AssessedTime.write(Optional.ofNullable(date.getValue()), time.getText(),
                clock.getZone());
        syncing = true;
        try {
            field.textProperty().set(w.iso());
        } finally {
            syncing = false;
        }
        problem.set(w.refused() ? "PROBLEM: " + w.problem() : AssessedTime.twiceNote(w.iso(), clock.getZone()));
    }

    /** Takes a date typed into the picker's text before focus leaves it by Enter (the picker would wait). */
    static void commitTyped(DatePicker picker) {
        String typed = picker.getEditor().getText();
        try {
            picker.setValue(typed == null || typed.isBlank() ? null : picker.getConverter().fromString(typed.strip()));
        } catch (DateTimeParseException notADate) {
            // the picker keeps its date; its text shows what was typed until it is corrected
        }
    }

    private static StringConverter<LocalDate> isoDates() {
        return new StringConverter<>() {
            @Override
            public String toString(LocalDate d) {
                return d == null ? "" : ISO_DATE.format(d);
            }

            @Override
            public LocalDate fromString(String s) {
                return s == null || s.isBlank() ? null : LocalDate.parse(s.strip(), ISO_DATE);
            }
        };
    }
}
