-- The audit trail holds in the database itself, whoever writes to it: history rows are never changed or
-- removed, a referral is never removed, and the snapshot a referral was assessed on never changes.
-- (PostgreSQL dialect; the SQLite file of the same version does the same.)

CREATE FUNCTION referral_event_append_only() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    RAISE EXCEPTION 'referral_event is append-only: history rows are never changed or removed';
END;
$$;

CREATE TRIGGER referral_event_no_change BEFORE UPDATE OR DELETE ON referral_event
    FOR EACH ROW EXECUTE FUNCTION referral_event_append_only();

CREATE TRIGGER referral_event_no_truncate BEFORE TRUNCATE ON referral_event
    FOR EACH STATEMENT EXECUTE FUNCTION referral_event_append_only();

CREATE FUNCTION referral_never_removed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    RAISE EXCEPTION 'a referral is never removed from the register';
END;
$$;

CREATE TRIGGER referral_no_delete BEFORE DELETE ON referral
    FOR EACH ROW EXECUTE FUNCTION referral_never_removed();

CREATE TRIGGER referral_no_truncate BEFORE TRUNCATE ON referral
    FOR EACH STATEMENT EXECUTE FUNCTION referral_never_removed();

CREATE FUNCTION referral_snapshot_fixed() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    IF (NEW.id, NEW.received_at, NEW.referrer, NEW.location, NEW.procedure_asked, NEW.patient_label,
        NEW.case_json, NEW.rule_set_name, NEW.rule_set_version, NEW.rule_set_sha256, NEW.highest_level,
        NEW.urgency_rank, NEW.hyperviscosity, NEW.leukostasis, NEW.tumor_lysis, NEW.top_flag, NEW.added_by,
        NEW.added_at)
       IS DISTINCT FROM
       (OLD.id, OLD.received_at, OLD.referrer, OLD.location, OLD.procedure_asked, OLD.patient_label,
        OLD.case_json, OLD.rule_set_name, OLD.rule_set_version, OLD.rule_set_sha256, OLD.highest_level,
        OLD.urgency_rank, OLD.hyperviscosity, OLD.leukostasis, OLD.tumor_lysis, OLD.top_flag, OLD.added_by,
        OLD.added_at)
       OR NEW.version <= OLD.version THEN
        RAISE EXCEPTION 'the referral snapshot is fixed: only its decision changes, with a higher version';
    END IF;
    RETURN NEW;
END;
$$;

CREATE TRIGGER referral_snapshot_fixed BEFORE UPDATE ON referral
    FOR EACH ROW EXECUTE FUNCTION referral_snapshot_fixed();
