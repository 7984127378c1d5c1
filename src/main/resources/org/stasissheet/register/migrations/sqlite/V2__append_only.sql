-- The audit trail holds in the database itself, whoever writes to it: history rows are never changed or
-- removed, a referral is never removed, and the snapshot a referral was assessed on never changes.
-- (SQLite dialect; the PostgreSQL file of the same version does the same.)

CREATE TRIGGER referral_event_no_update BEFORE UPDATE ON referral_event
BEGIN
    SELECT RAISE(ABORT, 'referral_event is append-only: history rows are never changed');
END;

CREATE TRIGGER referral_event_no_delete BEFORE DELETE ON referral_event
BEGIN
    SELECT RAISE(ABORT, 'referral_event is append-only: history rows are never removed');
END;

CREATE TRIGGER referral_no_delete BEFORE DELETE ON referral
BEGIN
    SELECT RAISE(ABORT, 'a referral is never removed from the register');
END;

CREATE TRIGGER referral_snapshot_fixed BEFORE UPDATE ON referral
WHEN NEW.received_at IS NOT OLD.received_at OR NEW.referrer IS NOT OLD.referrer
    OR NEW.location IS NOT OLD.location OR NEW.procedure_asked IS NOT OLD.procedure_asked
    OR NEW.patient_label IS NOT OLD.patient_label OR NEW.case_json IS NOT OLD.case_json
    OR NEW.rule_set_name IS NOT OLD.rule_set_name OR NEW.rule_set_version IS NOT OLD.rule_set_version
    OR NEW.rule_set_sha256 IS NOT OLD.rule_set_sha256 OR NEW.highest_level IS NOT OLD.highest_level
    OR NEW.urgency_rank IS NOT OLD.urgency_rank OR NEW.hyperviscosity IS NOT OLD.hyperviscosity
    OR NEW.leukostasis IS NOT OLD.leukostasis OR NEW.tumor_lysis IS NOT OLD.tumor_lysis
    OR NEW.top_flag IS NOT OLD.top_flag OR NEW.added_by IS NOT OLD.added_by OR NEW.added_at IS NOT OLD.added_at
    OR NEW.id IS NOT OLD.id OR NEW.version <= OLD.version
BEGIN
    SELECT RAISE(ABORT, 'the referral snapshot is fixed: only its decision changes, with a higher version');
END;
