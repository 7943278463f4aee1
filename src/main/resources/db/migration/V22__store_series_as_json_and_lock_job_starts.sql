-- A stored forecast keeps its monthly series as JSON arrays of numbers, not semicolon-joined text: "1.5;NaN;0.25"
-- becomes "[1.5,null,0.25]" (JSON has no NaN; a missing value is null). An empty series becomes "[]"; a null column
-- (runs made before monthly variances were kept) stays null. Plain string functions that H2 and PostgreSQL share.
update part_forecast set
    monthly_forecast   = '[' || replace(replace(monthly_forecast, ';', ','), 'NaN', 'null') || ']',
    preventive_monthly = '[' || replace(replace(preventive_monthly, ';', ','), 'NaN', 'null') || ']',
    monthly_history    = '[' || replace(replace(monthly_history, ';', ','), 'NaN', 'null') || ']',
    monthly_variance   = '[' || replace(replace(monthly_variance, ';', ','), 'NaN', 'null') || ']';

