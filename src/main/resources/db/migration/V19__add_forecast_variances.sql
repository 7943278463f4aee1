-- A stored forecast keeps the variance of each month's total demand and of the first 12 months' total (which is not
-- the sum of the months' variances: the rate's uncertainty is shared between months). Rows of earlier runs have none.
alter table part_forecast add column monthly_variance varchar(2000);
alter table part_forecast add column year_variance double precision;
