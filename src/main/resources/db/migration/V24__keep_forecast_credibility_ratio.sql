-- A stored forecast keeps the credibility ratio its series was given (the fleet rate's multiplier from the series'
-- own history; 1 where the history added nothing), so a spend projection as of the run's origin can use the run's
-- rates as they were instead of fitting them again. Null for series with no fleet expectation, and in earlier runs.
alter table part_forecast add column credibility_ratio double precision;
