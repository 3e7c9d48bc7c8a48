-- Blind second review and rulings.
-- A batch's share of cells reviewed twice and the seed that chose them; a cell's mark.
alter table batch add column second_share double precision default 0 not null;
alter table batch add column second_seed bigint default 0 not null;
alter table cell add column second_review boolean default false not null;

-- The second, independent pass over a cell chosen for second review. It opens when the
-- cell's first pass is finished; its validator is never one of the first pass's.
create table second_pass (
    cell_id            bigint primary key references cell (id) on delete cascade,
    batch_id           bigint not null,
    first_validator_id bigint not null references app_user (id),
    holder_id          bigint references app_user (id),
    lease_expires_at   timestamp with time zone,
    validator_id       bigint references app_user (id),
    decided_count      int    not null,
    draft_count        int    not null,
    opened_at          timestamp with time zone not null,
    finished_at        timestamp with time zone,
    version            int    not null
);
create index ix_second_pass_open on second_pass (batch_id, finished_at, holder_id);

-- The standing verdict of each draft in each pass (1 first review, 2 second review,
-- 0 a lead's ruling), kept in the verdict's transaction: what agreement is computed on.
create table pass_verdict (
    draft_id     bigint not null references draft (id) on delete cascade,
    review_pass  smallint not null,
    verdict_id   uuid   not null,
    cell_id      bigint not null,
    batch_id     bigint not null,
    verdict      varchar(16) not null,
    reason_code  varchar(64) not null,
    validator_id bigint not null,
    confidence   double precision not null,
    decided_at   timestamp with time zone not null,
    primary key (draft_id, review_pass)
);
create index ix_pass_verdict_batch on pass_verdict (batch_id, review_pass, decided_at);
create index ix_pass_verdict_cell on pass_verdict (cell_id);

-- Drafts waiting for a lead: the two passes disagree, or one escalated.
create table ruling_case (
    draft_id  bigint primary key references draft (id) on delete cascade,
    batch_id  bigint not null,
    cell_id   bigint not null,
    cause     varchar(16) not null,
    opened_at timestamp with time zone not null,
    ruled_at  timestamp with time zone,
    ruling_id uuid
);
create index ix_ruling_case_open on ruling_case (batch_id, ruled_at);
