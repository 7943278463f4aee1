-- Who started a forecast run: the signed-in account, "system:forecast-schedule" for the nightly run, or for a run an
-- accuracy check made, the account that started the check. Runs made since V18 take it from their background job;
-- older runs have none (the pages say "not recorded").
alter table forecast_run add column started_by varchar(80);
update forecast_run set started_by = (select j.started_by from background_job j where j.id = forecast_run.job_id)
    where job_id is not null;
