-- Undo: a withdrawal takes a verdict back without changing the append-only log. One
-- withdrawal per verdict, so a retried undo stores nothing new. The draft's current verdict
-- then falls back to the verdict it superseded, if that one still stands, or to none.
create table verdict_withdrawal (
    verdict_id   uuid primary key references verdict (id) on delete cascade,
    withdrawn_by bigint not null references app_user (id),
    withdrawn_at timestamp with time zone not null
);
