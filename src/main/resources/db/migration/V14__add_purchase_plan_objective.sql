-- Purchase plans state their objective's horizon, and what was left out: the unfunded remainder of each line and why.
alter table purchase_plan add column horizon_days_min integer;
alter table purchase_plan add column horizon_days_max integer;
alter table purchase_plan_line add column unfunded_quantity numeric(14, 3) default 0 not null;
alter table purchase_plan_line add column left_out_reason varchar(40);
alter table purchase_plan_line add constraint ck_purchase_plan_line_left_out
    check (left_out_reason is null or left_out_reason in ('BUDGET', 'OTHER_CURRENCY', 'NO_FORECAST'));
