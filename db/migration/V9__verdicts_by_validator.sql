-- Undo and a validator's own figures look verdicts up by their author: the latest of a
-- validator's verdicts in a cell (what an undo may take back), and the standing verdicts a
-- validator gave since a moment (the start page's figures for the day). Withdrawn verdicts
-- stay in the log; verdict_withdrawal (V6) marks them.
create index ix_verdict_cell_validator on verdict (cell_id, validator_id, created_at);
create index ix_pass_verdict_validator on pass_verdict (validator_id, decided_at);
