-- The first day of a spend projection: runs may start from a past month, using only what was known then.
alter table spend_run add column origin date;
