-- A stored fleet model keeps its lists as JSON, not semicolon-joined text: terms "log_depth;age_years" become
-- '["log_depth","age_years"]' (none: "[]"), coefficients and standard errors "-7.1;0.4" become "[-7.1,0.4]" (a
-- missing value, NaN, becomes null; none: "[]"). New runs also keep the coefficients' covariance (an array of rows)
-- and the depot ratios (an object keyed by depot id); rows of earlier runs have null there. Plain string functions
-- and standard type changes that H2 and PostgreSQL share.
alter table fleet_model_fit alter column covariates set data type varchar(1000);
alter table fleet_model_fit alter column coefficients set data type varchar(4000);
alter table fleet_model_fit alter column standard_errors set data type varchar(4000);

update fleet_model_fit set
    covariates      = case when covariates = '' then '[]' else '["' || replace(covariates, ';', '","') || '"]' end,
    coefficients    = '[' || replace(replace(coefficients, ';', ','), 'NaN', 'null') || ']',
    standard_errors = '[' || replace(replace(standard_errors, ';', ','), 'NaN', 'null') || ']';

alter table fleet_model_fit add column covariance varchar(8000);
alter table fleet_model_fit add column depot_ratios varchar(100000);
