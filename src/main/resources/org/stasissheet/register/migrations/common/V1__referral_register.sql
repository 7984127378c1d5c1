-- The referral register: one row per referral (its current state) and an append-only history of every change.
-- The same statements run on SQLite and PostgreSQL. ${id_column} is the one dialect difference (an identity
-- column), filled in per database by the application. Times are UTC instants written as ISO 8601 text
-- (uuuu-MM-ddTHH:mm:ss.SSSZ), which sorts in time order on both databases.

CREATE TABLE referral (
    id                ${id_column},
    version           INTEGER NOT NULL CHECK (version >= 1),
    received_at       VARCHAR(30) NOT NULL,
    referrer          VARCHAR(500) NOT NULL,
    location          VARCHAR(500) NOT NULL,
    procedure_asked   VARCHAR(30) NOT NULL
        CHECK (procedure_asked IN ('plasma-exchange', 'leukapheresis', 'not-stated')),
    patient_label     VARCHAR(500) NOT NULL,
    case_json         TEXT NOT NULL,
    rule_set_name     VARCHAR(200) NOT NULL,
    rule_set_version  VARCHAR(100) NOT NULL,
    rule_set_sha256   VARCHAR(64) NOT NULL,
    highest_level     VARCHAR(20) NOT NULL CHECK (highest_level IN ('act-now', 'review', 'note', 'none')),
    urgency_rank      INTEGER NOT NULL CHECK (urgency_rank BETWEEN 0 AND 3),
    hyperviscosity    VARCHAR(500) NOT NULL,
    leukostasis       VARCHAR(500) NOT NULL,
    tumor_lysis       VARCHAR(500) NOT NULL,
    top_flag          VARCHAR(500) NOT NULL,
    decision          VARCHAR(30) NOT NULL
        CHECK (decision IN ('pending', 'accepted', 'declined', 'deferred', 'more-information')),
    decided_by        VARCHAR(200),
    decided_at        VARCHAR(30),
    planned_slot      VARCHAR(30),
    vascular_access   VARCHAR(500),
    replacement_fluid VARCHAR(500),
    decision_note     VARCHAR(4000),
    added_by          VARCHAR(200) NOT NULL,
    added_at          VARCHAR(30) NOT NULL
);

CREATE INDEX referral_by_urgency ON referral (decision, urgency_rank, received_at, id);

CREATE TABLE referral_event (
    id          ${id_column},
    referral_id BIGINT NOT NULL REFERENCES referral (id),
    at          VARCHAR(30) NOT NULL,
    actor       VARCHAR(200) NOT NULL,
    what        VARCHAR(30) NOT NULL,
    from_value  VARCHAR(4000) NOT NULL,
    to_value    VARCHAR(4000) NOT NULL
);

CREATE INDEX referral_event_by_referral ON referral_event (referral_id, id);
