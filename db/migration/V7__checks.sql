-- What the automated checks found at upload, and the order in which cells are handed out.
-- A draft's risk is 1 - confidence when it carries no flag (see RiskScore); its flags are a JSON
-- array written once at upload, null when the checks found nothing.
alter table draft add column risk double precision default 0 not null;
alter table draft add column flags varchar(1048576);

-- A cell's risk is the mean of its riskiest drafts; queue_rank is its place in the batch's
-- queue order (lowest first), recomputed when a lead changes the order.
alter table cell add column risk double precision default 0 not null;
alter table cell add column queue_rank int default 0 not null;
create index ix_cell_rank on cell (batch_id, queue_rank);

-- The lead's settings of the checks (JSON, every threshold spelled out) and of the queue order.
alter table batch add column check_settings varchar(10000);
alter table batch add column queue_order varchar(16) default 'risk' not null;
alter table batch add column queue_seed bigint default 0 not null;

-- How many drafts of a batch carry each flag, counted at upload.
create table batch_flag_count (
    batch_id bigint      not null references batch (id) on delete cascade,
    code     varchar(64) not null,
    drafts   int         not null,
    primary key (batch_id, code)
);
