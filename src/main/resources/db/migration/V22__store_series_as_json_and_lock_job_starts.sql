-- A stored forecast keeps its monthly series as JSON arrays of numbers, not semicolon-joined text: "1.5;NaN;0.25"
-- becomes "[1.5,null,0.25]" (JSON has no NaN; a missing value is null). An empty series becomes "[]"; a null column
-- (runs made before monthly variances were kept) stays null. Plain string functions that H2 and PostgreSQL share.
update part_forecast set
    monthly_forecast   = '[' || replace(replace(monthly_forecast, ';', ','), 'NaN', 'null') || ']',
    preventive_monthly = '[' || replace(replace(preventive_monthly, ';', ','), 'NaN', 'null') || ']',
    monthly_history    = '[' || replace(replace(monthly_history, ';', ','), 'NaN', 'null') || ']',
    monthly_variance   = '[' || replace(replace(monthly_variance, ';', ','), 'NaN', 'null') || ']';

-- Starting a job of an exclusive kind (one forecast run, one accuracy report at a time) takes this kind's row lock
-- first, by updating it, so two instances cannot both find no running job and both insert one: the second waits for
-- the first's transaction and then sees its job. One row per kind; a kind added later gets its row on first use.
create table job_start_lock (
    kind            varchar(40)  not null,
    last_start_at   timestamp with time zone,
    constraint pk_job_start_lock primary key (kind)
);
insert into job_start_lock (kind) values ('FORECAST_RUN');
insert into job_start_lock (kind) values ('ACCURACY_REPORT');
insert into job_start_lock (kind) values ('SPEND_RUN');
