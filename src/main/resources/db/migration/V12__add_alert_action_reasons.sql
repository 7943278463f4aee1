-- One alert per part and location: an acknowledgement or snooze covers every reason the alert had when it was
-- taken (comma-separated alert kinds); alert_kind keeps the most pressing one.
alter table alert_action add column reasons varchar(200);
update alert_action set reasons = alert_kind;
create index ix_alert_action_part_location on alert_action (location_code, part_id);
