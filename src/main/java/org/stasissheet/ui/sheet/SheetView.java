package org.stasissheet.ui.sheet;

import java.util.List;
import java.util.Objects;
import java.util.Optional;
import javafx.beans.binding.Bindings;
import javafx.css.PseudoClass;
import javafx.scene.Node;
import javafx.scene.control.Label;
import javafx.scene.control.ScrollPane;
import javafx.scene.layout.ColumnConstraints;
import javafx.scene.layout.FlowPane;
import javafx.scene.layout.GridPane;
import javafx.scene.layout.HBox;
import javafx.scene.layout.Priority;
import javafx.scene.layout.VBox;
import org.stasissheet.derived.ExchangeProjection;
import org.stasissheet.rules.Flag;
import org.stasissheet.ui.chart.FlowChartModel;
import org.stasissheet.ui.chart.FlowChartView;
import org.stasissheet.worksheet.Cautions;

/**
 * The worksheet side: rule-set badge, notices, the three verdicts, the flags grouped by level (each one
 * expands to its explanation, source and basis), the flow chart, the apheresis numbers, the inputs as read, and
 * the standing cautions. It lays out {@link SheetContent} and computes nothing.
 *
 * <p>An edit usually changes a few numbers, so a section is rebuilt only when its content changed, and a table
 * whose shape stayed the same gets its texts replaced in place: new nodes cost CSS and layout, a new text only
 * layout (src/bench/edit-latency.sh measures it). An expanded flag stays expanded while its section is unchanged.
 */
public final class SheetView {
    private static final PseudoClass RAISED = PseudoClass.getPseudoClass("raised");

    private final VBox body = new VBox(10);
    private final ScrollPane root = new ScrollPane(body);
    private final Label badge = new Label();
    private final Label local = new Label("LOCAL PROTOCOL: this rule set differs from the shipped one");
    private final Label leftOut = new Label();
    private final Label blocking = new Label();
    private final FlowPane verdicts = new FlowPane(10, 10);
    private final VBox flags = new VBox(6);
    private final VBox apheresis = new VBox(6);
    private final GridPane inputs = new GridPane();
    /** Held so the chart (and the binding feeding it) lives as long as this view. */
    private final FlowChartView chart;
    /** What is on screen; null before the first content. */
    private SheetContent showing;
    private GridPane volumeGrid;
    private GridPane exchangeGrid;
    private GridPane leukaGrid;

    public SheetView(SheetViewModel model) {
        Objects.requireNonNull(model, "model");
        root.setFitToWidth(true);
        root.getStyleClass().add("sheet-side");
        root.setAccessibleText("Worksheet");
        body.getStyleClass().add("sheet-body");
        body.setMinWidth(0);
        verdicts.prefWrapLengthProperty().bind(root.widthProperty().subtract(40));
        badge.setId("rule-set-badge");
        badge.getStyleClass().add("rule-set-badge");
        local.setId("local-protocol");
        local.getStyleClass().addAll("notice", "notice-local");
        leftOut.setId("left-out-notice");
        leftOut.getStyleClass().addAll("notice", "notice-incomplete");
        blocking.setId("no-worksheet");
        blocking.getStyleClass().addAll("notice", "notice-blocking");
        for (Label l : List.of(local, leftOut, blocking)) {
            l.setWrapText(true);
            l.managedProperty().bind(l.visibleProperty());
        }
        verdicts.setId("verdicts");
        flags.setId("flags");
        inputs.getStyleClass().add("sheet-grid");
        labelled(inputs);
        chart = new FlowChartView(Bindings.createObjectBinding(
                () -> model.content().flow(), model.contentProperty()));
        HBox badgeRow = new HBox(8, badge);
        body.getChildren().addAll(badgeRow, local, leftOut, blocking,
                heading("Verdicts"), verdicts,
                heading("Flags"), flags,
                chart.node(),
                heading("Apheresis planning numbers"), apheresis,
                heading("Inputs as read (entered = canonical unit)"), inputs,
                cautions());
        model.contentProperty().addListener((o, was, now) -> show(now));
        show(model.content());
    }

    public Node node() {
        return root;
    }

    private void show(SheetContent c) {
        SheetContent was = showing;
        showing = c;
        badge.setText(c.ruleSetBadge());
        if (was == null || !was.worksheet().map(w -> w.ruleSet().sha256())
                .equals(c.worksheet().map(w -> w.ruleSet().sha256()))) {
            // the hash is provenance, not a sentence: it stays one hover away
            badge.setTooltip(c.worksheet().map(w -> new javafx.scene.control.Tooltip("SHA-256 "
                    + w.ruleSet().sha256())).orElse(null));
        }
        local.setVisible(c.localProtocol());
        leftOut.setVisible(!c.leftOut().isEmpty());
        leftOut.setText("INCOMPLETE: this worksheet leaves out " + String.join(", ", c.leftOut())
                + ". Fix the entries marked PROBLEM to include them.");
        blocking.setVisible(c.worksheet().isEmpty());
        blocking.setText(c.blocking().isEmpty() ? "NO WORKSHEET yet."
                : "NO WORKSHEET: the case cannot be read.\n" + String.join("\n", c.blocking()));
        if (was == null || !sameCards(was.verdicts(), c.verdicts())) {
            verdicts.getChildren().setAll(c.verdicts().stream().map(SheetView::verdict).toList());
        } else if (!was.verdicts().equals(c.verdicts())) {
            for (int i = 0; i < c.verdicts().size(); i++) {
                refill((VBox) verdicts.getChildren().get(i), c.verdicts().get(i));
            }
        }
        if (was == null || was.worksheet().isPresent() != c.worksheet().isPresent()
                || !was.flagGroups().equals(c.flagGroups())) {
            showFlags(c);
        }
        if (was == null || was.worksheet().isPresent() != c.worksheet().isPresent()
                || was.volumes().size() != c.volumes().size() || was.exchanges().size() != c.exchanges().size()
                || was.leukapheresis().size() != c.leukapheresis().size()
                || !was.apheresisNotes().equals(c.apheresisNotes())
                || !missingSentence(was).equals(missingSentence(c))) {
            showApheresis(c);
        } else {
            relabel(volumeGrid, 0, rowTexts(c.volumes()));
            relabel(exchangeGrid, 7, exchangeTexts(c.exchanges()));
            relabel(leukaGrid, 0, rowTexts(c.leukapheresis()));
        }
        if (was == null || was.inputs().size() != c.inputs().size()) {
            inputs.getChildren().clear();
            int row = 0;
            for (SheetContent.Row r : c.inputs()) {
                inputs.addRow(row++, cell(r.label(), "row-label"), cell(r.value(), "row-value"));
            }
        } else {
            relabel(inputs, 0, rowTexts(c.inputs()));
        }
    }

    /** The one sentence naming what to enter for the apheresis numbers, when something is missing. */
    private static Optional<String> missingSentence(SheetContent c) {
        return c.worksheet().flatMap(w -> w.apheresis().missing().sentence());
    }

    /** Sets the texts of a table whose shape did not change, skipping its first {@code skip} cells (headings). */
    private static void relabel(GridPane grid, int skip, List<String> texts) {
        if (grid == null) {
            return;
        }
        List<Node> cells = grid.getChildren();
        for (int i = 0; i < texts.size() && skip + i < cells.size(); i++) {
            ((Label) cells.get(skip + i)).setText(texts.get(i));
        }
    }

    private static List<String> rowTexts(List<SheetContent.Row> rows) {
        return rows.stream().flatMap(r -> java.util.stream.Stream.of(r.label(), r.value())).toList();
    }

    private static List<String> exchangeTexts(List<SheetContent.ExchangeLine> lines) {
        return lines.stream().flatMap(e -> java.util.stream.Stream.of(e.plasmaVolumes(), e.volume(),
                e.intravascularLeft(), e.paraproteinImmediate(), e.paraproteinAfterRedistribution(),
                e.viscosityImmediate(), e.viscosityAfterRedistribution())).toList();
    }

    /** Cards with the same ids and the same number of lines can take each other's texts in place. */
    private static boolean sameCards(List<SheetContent.VerdictCard> a, List<SheetContent.VerdictCard> b) {
        if (a.size() != b.size()) {
            return false;
        }
        for (int i = 0; i < a.size(); i++) {
            if (!a.get(i).id().equals(b.get(i).id()) || a.get(i).lines().size() != b.get(i).lines().size()) {
                return false;
            }
        }
        return true;
    }

    /** Puts a card's texts into the nodes {@link #verdict} made for a card of the same shape. */
    private static void refill(VBox card, SheetContent.VerdictCard v) {
        List<Node> labels = card.getChildren();
        ((Label) labels.get(0)).setText(v.title());
        ((Label) labels.get(1)).setText((v.raised() ? "● " : "○ ") + v.word());
        for (int i = 0; i < v.lines().size(); i++) {
            ((Label) labels.get(2 + i)).setText(v.lines().get(i));
        }
        card.pseudoClassStateChanged(RAISED, v.raised());
        card.setAccessibleText(v.title() + ": " + v.word());
    }

    private static Node verdict(SheetContent.VerdictCard v) {
        Label title = new Label(v.title());
        title.getStyleClass().add("verdict-title");
        Label word = new Label((v.raised() ? "● " : "○ ") + v.word());
        word.setWrapText(true);
        word.setId("verdict-" + v.id() + "-word");
        word.getStyleClass().add("verdict-word");
        VBox card = new VBox(4, title, word);
        for (String line : v.lines()) {
            Label l = new Label(line);
            l.setWrapText(true);
            l.getStyleClass().add("verdict-line");
            card.getChildren().add(l);
        }
        card.setId("verdict-" + v.id());
        card.getStyleClass().add("verdict-card");
        card.pseudoClassStateChanged(RAISED, v.raised());
        card.setAccessibleText(v.title() + ": " + v.word());
        card.setFocusTraversable(false);
        return card;
    }

    private void showFlags(SheetContent c) {
        flags.getChildren().clear();
        if (c.worksheet().isPresent() && c.flagGroups().isEmpty()) {
            flags.getChildren().add(cell("No rule fired. This does not rule anything out.", "flag-none"));
        }
        for (SheetContent.FlagGroup g : c.flagGroups()) {
            Label head = new Label(g.heading());
            head.getStyleClass().addAll("flag-group-heading", "level-" + g.level().code());
            head.setId("flag-group-" + g.level().code());
            VBox group = new VBox(2, head);
            group.getStyleClass().addAll("flag-group", "level-" + g.level().code());
            for (Flag f : g.flags()) {
                Label explanation = new Label(f.explanation());
                explanation.setWrapText(true);
                Label source = new Label("Source: " + f.source());
                source.setWrapText(true);
                Label basis = new Label("Basis: " + f.basis().words() + "   ·   rule " + f.id());
                basis.getStyleClass().add("flag-basis");
                VBox detail = new VBox(3, explanation, source, basis);
                // A wrapping title and a details toggle instead of a titled pane: nothing is cut off.
                Label title = new Label(g.level().badge() + ": " + f.title());
                title.setWrapText(true);
                title.getStyleClass().add("flag-title");
                javafx.scene.control.ToggleButton more = new javafx.scene.control.ToggleButton("source and basis");
                more.setId("flag-" + f.id().replaceAll("[^A-Za-z0-9_-]", "_") + "-details");
                more.getStyleClass().add("flag-details-toggle");
                more.setAccessibleText("Show the explanation, source and basis of: " + f.title());
                more.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
                detail.visibleProperty().bind(more.selectedProperty());
                detail.managedProperty().bind(more.selectedProperty());
                detail.getStyleClass().add("flag-detail");
                HBox titleRow = new HBox(8, title, more);
                HBox.setHgrow(title, Priority.ALWAYS);
                title.setMaxWidth(Double.MAX_VALUE);
                VBox pane = new VBox(2, titleRow, detail);
                pane.setId("flag-" + f.id().replaceAll("[^A-Za-z0-9_-]", "_"));
                pane.getStyleClass().addAll("flag", "level-" + g.level().code());
                pane.setAccessibleText(g.level().word() + ": " + f.title());
                group.getChildren().add(pane);
            }
            flags.getChildren().add(group);
        }
    }


    private void showApheresis(SheetContent c) {
        apheresis.getChildren().clear();
        volumeGrid = null;
        exchangeGrid = null;
        leukaGrid = null;
        if (c.worksheet().isEmpty()) {
            return;
        }
        missingSentence(c).ifPresent(sentence -> {
            Label missing = cell(sentence, "apheresis-missing");
            missing.setId("apheresis-missing");
            missing.getStyleClass().addAll("notice", "notice-incomplete");
            apheresis.getChildren().add(missing);
        });
        GridPane volumes = labelled(grid("apheresis-volumes"));
        int row = 0;
        for (SheetContent.Row r : c.volumes()) {
            volumes.addRow(row++, cell(r.label(), "row-label"), cell(r.value(), "row-value"));
        }
        GridPane exchange = grid("exchange-table");
        // fixed shares, so that the short columns never collapse into one letter per line
        for (double percent : new double[] {11, 9, 15, 15, 17, 16, 17}) { // the first fits "volumes"
            ColumnConstraints column = new ColumnConstraints();
            column.setPercentWidth(percent);
            exchange.getColumnConstraints().add(column);
        }
        exchange.addRow(0, cell("plasma\nvolumes", "column-head"), cell("volume", "column-head"),
                cell("intravascular left", "column-head"),
                cell("paraprotein\n" + ExchangeProjection.IMMEDIATE_SHORT, "column-head"),
                cell("paraprotein\n" + ExchangeProjection.AFTER_REDISTRIBUTION_SHORT, "column-head"),
                cell("serum viscosity\n" + ExchangeProjection.IMMEDIATE_SHORT + " (projection)", "column-head"),
                cell("serum viscosity\n" + ExchangeProjection.AFTER_REDISTRIBUTION_SHORT + " (projection)",
                        "column-head"));
        row = 1;
        for (SheetContent.ExchangeLine e : c.exchanges()) {
            exchange.addRow(row++, cell(e.plasmaVolumes(), "row-value"), cell(e.volume(), "row-value"),
                    cell(e.intravascularLeft(), "row-value"), cell(e.paraproteinImmediate(), "row-value"),
                    cell(e.paraproteinAfterRedistribution(), "row-value"), cell(e.viscosityImmediate(), "row-value"),
                    cell(e.viscosityAfterRedistribution(), "row-value"));
        }
        GridPane leuka = labelled(grid("leukapheresis"));
        row = 0;
        for (SheetContent.Row r : c.leukapheresis()) {
            leuka.addRow(row++, cell(r.label(), "row-label"), cell(r.value(), "row-value"));
        }
        apheresis.getChildren().addAll(volumes, subheading("Plasma exchange: right after and after redistribution"),
                exchange, subheading("Leukapheresis"), leuka);
        c.apheresisNotes().forEach(n -> apheresis.getChildren().add(cell("NOTE: " + n, "apheresis-note")));
        volumeGrid = volumes;
        exchangeGrid = exchange;
        leukaGrid = leuka;
    }

    /**
     * A label column that keeps its full width (a long reason in the value column once squeezed it to three
     * letters) and a value column that takes the rest and wraps.
     */
    private static GridPane labelled(GridPane g) {
        ColumnConstraints label = new ColumnConstraints();
        label.setMinWidth(javafx.scene.layout.Region.USE_PREF_SIZE);
        ColumnConstraints value = new ColumnConstraints();
        value.setHgrow(Priority.ALWAYS);
        value.setMinWidth(0);
        g.getColumnConstraints().setAll(label, value);
        return g;
    }

    private static GridPane grid(String id) {
        GridPane g = new GridPane();
        g.setId(id);
        g.getStyleClass().add("sheet-grid");
        return g;
    }

    private static Node cautions() {
        VBox box = new VBox(3);
        box.setId("standing-cautions");
        box.getStyleClass().add("standing-cautions");
        box.getChildren().add(heading("Standing cautions"));
        for (String c : Cautions.STANDING) {
            box.getChildren().add(cell("• " + c, "caution-line"));
        }
        return box;
    }

    private static Label heading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("sheet-heading");
        return l;
    }

    private static Label subheading(String text) {
        Label l = new Label(text);
        l.getStyleClass().add("sheet-subheading");
        return l;
    }

    private static Label cell(String text, String style) {
        Label l = new Label(text);
        l.setWrapText(true);
        l.getStyleClass().add(style);
        HBox.setHgrow(l, Priority.ALWAYS);
        return l;
    }
}
