-- A forecast run states its origin (nothing dated on or after it was used); a stored forecast states the first
-- month of the history it was made from (the series' real start, not the configured window's).
alter table forecast_run add column origin date;
alter table part_forecast add column history_from date;
alter table part_forecast add column method_detail varchar(200);
