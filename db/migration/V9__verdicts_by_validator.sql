-- Undo and a validator's own figures look verdicts up by their author: the latest of a
-- validator's verdicts in a cell (what an undo may take back) and a validator's verdicts
-- of a day. Withdrawn verdicts stay in the log; verdict_withdrawal (V6) marks them.
create index ix_verdict_cell_validator on verdict (cell_id, validator_id, created_at);
create index ix_verdict_validator on verdict (validator_id, created_at);
