-- Per-unit transport cost between two stores, where the distance-based default is not right.
create table transfer_lane_cost (
    from_id   bigint         not null references location (id),
    to_id     bigint         not null references location (id),
    unit_cost numeric(12, 4) not null,
    primary key (from_id, to_id),
    constraint ck_transfer_lane_cost check (unit_cost >= 0)
);
