package org.stasissheet.register;

import java.time.Duration;
import java.time.Instant;
import java.time.ZoneId;
import java.util.List;
import java.util.Locale;
import org.stasissheet.report.Csv;
import org.stasissheet.worksheet.Cautions;

/** The register as people read it: the list, the CSV export and one referral's history. */
public final class RegisterReport {
    public static final List<String> CSV_COLUMNS = List.of("id", "version", "received_at", "referrer", "location",
            "procedure", "patient", "highest_level", "hyperviscosity", "leukostasis", "tumor_lysis", "top_flag",
            "decision", "decided_by", "decided_at", "hours_to_decision", "planned_slot", "hours_to_slot",
            "vascular_access", "replacement_fluid", "note", "rule_set", "rule_set_version", "rule_set_sha256");

    private RegisterReport() {
    }

    /** One line per referral in the order given, under the standing caution. */
    public static String text(List<Referral> referrals, ZoneId zone) {
        StringBuilder sb = new StringBuilder();
        sb.append(Cautions.SHORT).append('\n');
        if (referrals.isEmpty()) {
            return sb.append("No referrals.\n").toString();
        }
        for (Referral r : referrals) {
            sb.append(String.format(Locale.ROOT, "%5d  %-18s %s  %-16s %-17s v%d  %s", r.id(),
                    Urgency.badge(r.snapshot().highestLevel()), RegisterTime.show(r.receivedAt(), zone),
                    r.procedure().code(), r.decision().code(), r.version(), r.snapshot().patientLabel()));
            if (!r.snapshot().topFlag().isEmpty()) {
                sb.append(" | ").append(r.snapshot().topFlag());
            }
            sb.append('\n');
        }
        return sb.toString();
    }

    /**
     * RFC 4180 CSV, one row per referral. Without identifiers the patient label and the free-text note (which may
     * name the patient) are left empty; the case JSON is never exported.
     */
    public static String csv(List<Referral> referrals, boolean withIdentifiers) {
        StringBuilder sb = new StringBuilder();
        Csv.line(sb, CSV_COLUMNS);
        for (Referral r : referrals) {
            Snapshot s = r.snapshot();
            var d = r.decisionRecord();
            Csv.line(sb, List.of(Long.toString(r.id()), Integer.toString(r.version()),
                    RegisterTime.format(r.receivedAt()), r.referrer(), r.location(), r.procedure().code(),
                    withIdentifiers ? s.patientLabel() : "", Urgency.code(s.highestLevel()), s.hyperviscosity(),
                    s.leukostasis(), s.tumorLysis(), s.topFlag(), r.decision().code(),
                    d.map(Referral.DecisionRecord::by).orElse(""),
                    d.map(x -> RegisterTime.format(x.at())).orElse(""),
                    d.map(x -> hours(r.receivedAt(), x.at())).orElse(""),
                    d.flatMap(Referral.DecisionRecord::plannedSlot).map(RegisterTime::format).orElse(""),
                    d.flatMap(Referral.DecisionRecord::plannedSlot).map(t -> hours(r.receivedAt(), t)).orElse(""),
                    d.map(Referral.DecisionRecord::vascularAccess).orElse(""),
                    d.map(Referral.DecisionRecord::replacementFluid).orElse(""),
                    withIdentifiers ? d.map(Referral.DecisionRecord::note).orElse("") : "",
                    s.ruleSet().name(), s.ruleSet().version(), s.ruleSet().sha256()));
        }
        return sb.toString();
    }

    /** The referral as it stands, what it was assessed with, then every event, oldest first. */
    public static String history(Referral r, List<RegisterEvent> events, ZoneId zone) {
        StringBuilder sb = new StringBuilder();
        Snapshot s = r.snapshot();
        sb.append(Cautions.SHORT).append('\n');
        sb.append("Referral ").append(r.id()).append(" (version ").append(r.version()).append("): ")
                .append(s.patientLabel()).append('\n');
        sb.append("  received ").append(RegisterTime.show(r.receivedAt(), zone)).append(" from ")
                .append(orDash(r.referrer())).append(", at ").append(orDash(r.location())).append("; asked for: ")
                .append(r.procedure().words()).append('\n');
        sb.append("  assessed: ").append(Urgency.badge(s.highestLevel()));
        if (!s.topFlag().isEmpty()) {
            sb.append(" (").append(s.topFlag()).append(')');
        }
        sb.append("; hyperviscosity ").append(s.hyperviscosity()).append("; leukostasis ").append(s.leukostasis())
                .append("; tumor lysis ").append(s.tumorLysis()).append('\n');
        sb.append("  rule set: ").append(s.ruleSet().name()).append(' ').append(s.ruleSet().version())
                .append(", SHA-256 ").append(s.ruleSet().sha256()).append('\n');
        sb.append("  decision: ").append(r.decision().code());
        r.decisionRecord().ifPresent(d -> {
            sb.append(" by ").append(d.by()).append(" at ").append(RegisterTime.show(d.at(), zone));
            d.plannedSlot().ifPresent(t -> sb.append("; slot ").append(RegisterTime.show(t, zone)));
            if (!d.vascularAccess().isEmpty()) {
                sb.append("; access ").append(d.vascularAccess());
            }
            if (!d.replacementFluid().isEmpty()) {
                sb.append("; fluid ").append(d.replacementFluid());
            }
        });
        sb.append('\n').append("History (").append(events.size()).append(" events, oldest first):\n");
        for (RegisterEvent e : events) {
            sb.append("  ").append(RegisterTime.show(e.at(), zone)).append("  ").append(e.actor()).append(": ")
                    .append(e.what()).append(' ').append(e.from().isEmpty() ? "(none)" : e.from()).append(" -> ")
                    .append(e.to().isEmpty() ? "(none)" : e.to()).append('\n');
        }
        return sb.toString();
    }

    static String hours(Instant from, Instant to) {
        return String.format(Locale.ROOT, "%.1f", Duration.between(from, to).toMinutes() / 60.0);
    }

    private static String orDash(String s) {
        return s.isBlank() ? "(not given)" : s;
    }
}
