-- Programme-wide settings a lead changes through the API (e.g. the month its financial year starts).
create table programme_setting (
    setting_name  varchar(60)  not null primary key,
    setting_value varchar(200) not null,
    set_by        varchar(60)  not null,
    set_at        timestamp with time zone not null
);
