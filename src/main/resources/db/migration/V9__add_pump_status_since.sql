-- The date a pump's current status began, for every status (working since its last fix too), and the note of the
-- report that set it. broken_since and decommissioned_on stay as they were and follow status_since.
alter table pump add column status_since date;
alter table pump add column status_note varchar(300);
update pump set status_since = coalesce(broken_since, decommissioned_on);
