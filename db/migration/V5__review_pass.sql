-- Which review a verdict belongs to: 1 the first review of its cell, 2 the blind second
-- review, 0 a lead's ruling. Every verdict stored before second review existed is a first
-- review, hence the default.
alter table verdict add column review_pass smallint default 1 not null;
