-- Target cycle service levels per part class, set by the programme lead; the configuration gives the defaults.
create table service_level (
    part_class varchar(20)  not null primary key,
    level      numeric(6, 4) not null,
    set_by     varchar(60)  not null,
    set_at     timestamp with time zone not null,
    constraint ck_service_level check (level > 0 and level < 1 and part_class in ('CRITICAL', 'STANDARD'))
);
