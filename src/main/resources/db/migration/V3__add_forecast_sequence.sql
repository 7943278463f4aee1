-- Forecast rows are written tens of thousands at a time: a sequence lets Hibernate batch the inserts,
-- which identity columns prevent.
create sequence part_forecast_seq start with 1 increment by 50;
