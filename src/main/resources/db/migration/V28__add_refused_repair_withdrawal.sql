-- A mechanic who discards a refused repair on the phone withdraws its notice (WITHDRAWN), and every notice closed
-- says why in words. Notices closed before this column keep the reason their state already gave.

alter table refused_repair drop constraint ck_refused_repair_state;
alter table refused_repair add constraint ck_refused_repair_state
    check (state in ('OPEN', 'RECORDED', 'DISMISSED', 'WITHDRAWN'));
alter table refused_repair add column closed_reason varchar(120);
update refused_repair set closed_reason = 'the repair was recorded' where state = 'RECORDED';
update refused_repair set closed_reason = 'dismissed by the stores officer' where state = 'DISMISSED';
