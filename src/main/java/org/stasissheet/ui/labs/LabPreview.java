package org.stasissheet.ui.labs;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import java.util.function.Function;
import javafx.beans.binding.Bindings;
import javafx.beans.binding.BooleanBinding;
import javafx.beans.property.ObjectProperty;
import javafx.beans.property.ReadOnlyObjectProperty;
import javafx.beans.property.ReadOnlyObjectWrapper;
import javafx.beans.property.SimpleObjectProperty;
import javafx.beans.property.SimpleStringProperty;
import javafx.beans.property.StringProperty;
import javafx.collections.FXCollections;
import javafx.collections.ObservableList;
import org.stasissheet.labs.LabImport;
import org.stasissheet.labs.LabLine;
import org.stasissheet.labs.ReportText;
import org.stasissheet.measure.Analyte;
import org.stasissheet.measure.Numbers;

/**
 * The view-model of the import window: the pasted text (or a report read from a file), the preview rows it reads
 * as, one answer per question, and whether the result may be accepted. The reading itself is the pure
 * {@link ReportText}; nothing here decides what a line means.
 */
public final class LabPreview {
    /** One way to answer a question: an option, or leaving the line out. */
    public record Answer(String label, Optional<LabLine.Option> option) {
        @Override
        public String toString() {
            return label;
        }
    }

    /** A question of the current reading, with the answer chosen so far (none yet: accept stays off). */
    public record Question(int lineIndex, LabLine.Asked asked, List<Answer> answers,
                           ObjectProperty<Answer> chosen) {
    }

    /** One row of the preview table, in words. */
    public record Row(String where, String analyte, String value, String unit, String canonical, String outcome,
                      String text) {
    }

    private final StringProperty text = new SimpleStringProperty(this, "text", "");
    private final ReadOnlyObjectWrapper<Optional<LabImport>> reading =
            new ReadOnlyObjectWrapper<>(this, "reading", Optional.empty());
    private final ObservableList<Row> rows = FXCollections.observableArrayList();
    private final ObservableList<Question> questions = FXCollections.observableArrayList();
    private final ObjectProperty<Integer> answerTicks = new SimpleObjectProperty<>(this, "answerTicks", 0);
    private final BooleanBinding acceptable;
    private final Function<Analyte, String> current;

    /** @param current what the form holds now for an analyte ("150 10*9/L"), empty when nothing */
    public LabPreview(Function<Analyte, String> current) {
        this.current = Objects.requireNonNull(current, "current");
        text.addListener((o, was, now) -> show(now.isBlank() ? Optional.empty() : Optional.of(ReportText.read(now))));
        acceptable = Bindings.createBooleanBinding(this::canAccept, reading, answerTicks);
    }

    /** What was pasted; every change re-reads it. */
    public StringProperty textProperty() {
        return text;
    }

    public ReadOnlyObjectProperty<Optional<LabImport>> readingProperty() {
        return reading.getReadOnlyProperty();
    }

    public ObservableList<Row> rows() {
        return rows;
    }

    public ObservableList<Question> questions() {
        return questions;
    }

    /** True when there is something to take and every question has an answer (leaving out counts). */
    public BooleanBinding acceptableProperty() {
        return acceptable;
    }

    /** Shows a report read from a file (FHIR, HL7 v2 or text) instead of the pasted text. */
    public void show(Optional<LabImport> read) {
        reading.set(read);
        questions.clear();
        List<Row> list = new ArrayList<>();
        read.ifPresent(r -> {
            for (int i = 0; i < r.lines().size(); i++) {
                LabLine line = r.lines().get(i);
                list.add(row(line, current));
                if (line instanceof LabLine.Asked asked) {
                    List<Answer> answers = new ArrayList<>();
                    asked.options().forEach(o -> answers.add(new Answer(o.label(), Optional.of(o))));
                    answers.add(new Answer("leave this line out", Optional.empty()));
                    ObjectProperty<Answer> chosen = new SimpleObjectProperty<>(null);
                    chosen.addListener((o, was, now) -> answerTicks.set(answerTicks.get() + 1));
                    questions.add(new Question(i, asked, List.copyOf(answers), chosen));
                }
            }
        });
        rows.setAll(list);
        answerTicks.set(answerTicks.get() + 1);
    }

    /** The reading with every answer applied; present only when {@link #acceptableProperty()} holds. */
    public Optional<LabImport> accepted() {
        if (!canAccept()) {
            return Optional.empty();
        }
        LabImport r = reading.get().orElseThrow();
        for (Question q : questions) {
            r = r.answer(q.lineIndex(), q.chosen().get().option());
        }
        return Optional.of(r);
    }

    private boolean canAccept() {
        Optional<LabImport> r = reading.get();
        if (r.isEmpty()) {
            return false;
        }
        boolean allAnswered = questions.stream().allMatch(q -> q.chosen().get() != null);
        boolean somethingToTake = !r.get().taken().isEmpty()
                || questions.stream().anyMatch(q -> q.chosen().get() != null && q.chosen().get().option().isPresent());
        return allAnswered && somethingToTake;
    }

    private static Row row(LabLine line, Function<Analyte, String> current) {
        Objects.requireNonNull(line, "line");
        if (line instanceof LabLine.Taken t) {
            var m = t.value();
            String canonical = Numbers.rounded(m.canonical(), 6) + " " + m.analyte().canonicalOption().display();
            String now = current.apply(m.analyte());
            String outcome = "will be imported" + (now.isEmpty() ? "" : ", replacing " + now)
                    + (t.flag().isEmpty() ? "" : "; flag " + t.flag())
                    + (t.note().isEmpty() ? "" : "; " + t.note());
            return new Row(t.where(), m.analyte().label(), Numbers.plain(m.entered().value()),
                    m.unitOption().display() + " (" + m.entered().unit() + ")", canonical, outcome, t.text());
        }
        if (line instanceof LabLine.Asked a) {
            return new Row(a.where(), a.analyte().label(), "?", "?", "?", "QUESTION: " + a.question(), a.text());
        }
        LabLine.Left l = (LabLine.Left) line;
        return new Row(l.where(), l.named().map(a -> a.label()).orElse("—"), "", "", "",
                "NOT IMPORTED: " + l.reason(), l.text());
    }
}
