/*
 * format.js: numbers, money, quantities and dates for people, in the browser's locale (Intl).
 *   qty(value, unit)      whole numbers for parts counted by the piece (EACH, PAIR, SET, LENGTH), at most two
 *                         decimals for measured ones, with the unit in words: "3 pieces", "12.5 m"
 *   units(unit)           the unit's plural in words for an average of it ("pieces", "m"), "units" when unknown
 *   num(value, digits=0)  thousands separators, at most `digits` decimals
 *   fixed(value, digits)  thousands separators, exactly `digits` decimals (figures compared in a column)
 *   pumpDays(value)       expected pump-days without water, always one decimal: "21.0", "261.4"
 *   money(value, currency) "USD 1,250.00" style from Intl, or the number and the code when Intl lacks it: amounts
 *                         that are exact (prices, order and plan lines and their totals)
 *   wholeMoney(value, currency) "USD 12,858": projections and their ranges (spend, back-check), whose cents mean nothing
 *   percent(share)        0.953 → "95.3 %"
 *   date(iso) dateTime(iso) relative(iso)  "3 Nov 2025", "3 Nov 2025, 08:14", "3 days ago" / "in 2 hours"
 *   family(code)          a component family as the trade writes it: "O_RING" → "O-ring", "CUP_SEAL" → "Cup seal"
 *   requestFor(request)   what a parts request is for: "Pump MJ-1", "Kit top-up", or "Pump down, no pump named"
 * Every function answers "–" for a missing value, never "NaN" or "null".
 */
const NONE = '–';
const locale = navigator.languages && navigator.languages.length ? navigator.languages[0] : navigator.language;

const WHOLE_UNITS = new Set(['EACH', 'PAIR', 'SET', 'LENGTH']);
const UNIT_WORDS = {
    EACH: ['piece', 'pieces'], PAIR: ['pair', 'pairs'], SET: ['set', 'sets'], LENGTH: ['length', 'lengths'],
    METRE: ['m', 'm'], KILOGRAM: ['kg', 'kg'], LITRE: ['L', 'L']
};

function missing(value) {
    return value === undefined || value === null || value === '' || Number.isNaN(Number(value));
}

export function num(value, digits = 0) {
    if (missing(value)) {
        return NONE;
    }
    const n = Number(value);
    // Rounds first, so that -0.2 shown without decimals is "0", not "-0".
    const shown = Math.round(n * 10 ** digits) / 10 ** digits;
    return new Intl.NumberFormat(locale, {maximumFractionDigits: digits, minimumFractionDigits: 0}).format(shown === 0 ? 0 : shown);
}

export function fixed(value, digits) {
    if (missing(value)) {
        return NONE;
    }
    const shown = Math.round(Number(value) * 10 ** digits) / 10 ** digits;
    return new Intl.NumberFormat(locale, {maximumFractionDigits: digits, minimumFractionDigits: digits})
        .format(shown === 0 ? 0 : shown);
}

/** One rule for pump-days on every page (board, alert details, transfers, budget plan): one decimal, always shown. */
export function pumpDays(value) {
    return fixed(value, 1);
}

export function units(unit) {
    return (UNIT_WORDS[unit] || [null, 'units'])[1];
}

export function wholeUnits(unit) {
    return !unit || WHOLE_UNITS.has(unit);
}

/** Whole units round to the nearest whole (planning numbers like 2.6 expected become "3"). */
export function qty(value, unit) {
    if (missing(value)) {
        return NONE;
    }
    const n = Number(value);
    const text = wholeUnits(unit) ? num(Math.round(n), 0) : num(n, 2);
    const words = UNIT_WORDS[unit];
    if (!words) {
        return text;
    }
    return `${text} ${Math.abs(Math.round(n)) === 1 && wholeUnits(unit) ? words[0] : words[1]}`;
}

/* The catalogue's family codes carry no display name: the ones the trade does not write in sentence case. */
const FAMILY_WORDS = {O_RING: 'O-ring'};

export function family(code) {
    if (code === undefined || code === null || code === '') {
        return NONE;
    }
    const key = String(code).toUpperCase();
    const words = key.replace(/_/g, ' ').toLowerCase();
    return FAMILY_WORDS[key] || words.charAt(0).toUpperCase() + words.slice(1);
}

export function money(value, currency) {
    if (missing(value)) {
        return NONE;
    }
    try {
        return new Intl.NumberFormat(locale, {style: 'currency', currency: currency || 'USD', currencyDisplay: 'code'})
            .format(Number(value));
    } catch (e) {
        return `${num(value, 2)} ${currency || ''}`.trim();
    }
}

export function wholeMoney(value, currency) {
    if (missing(value)) {
        return NONE;
    }
    try {
        return new Intl.NumberFormat(locale, {style: 'currency', currency: currency || 'USD', currencyDisplay: 'code',
            minimumFractionDigits: 0, maximumFractionDigits: 0}).format(Math.round(Number(value)) || 0);
    } catch (e) {
        return `${num(value, 0)} ${currency || ''}`.trim();
    }
}

export function percent(share, digits = 1) {
    return missing(share) ? NONE : `${num(Number(share) * 100, digits)} %`;
}

function toDate(iso) {
    if (iso === undefined || iso === null || iso === '') {
        return null;
    }
    // A plain date (2025-11-03) is a calendar day, not midnight UTC shifted into the user's zone.
    const d = /^\d{4}-\d{2}-\d{2}$/.test(iso) ? new Date(`${iso}T12:00:00`) : new Date(iso);
    return Number.isNaN(d.getTime()) ? null : d;
}

export function date(iso) {
    const d = toDate(iso);
    return d ? new Intl.DateTimeFormat(locale, {day: 'numeric', month: 'short', year: 'numeric'}).format(d) : NONE;
}

export function dateTime(iso) {
    const d = toDate(iso);
    return d ? new Intl.DateTimeFormat(locale, {day: 'numeric', month: 'short', year: 'numeric', hour: '2-digit',
        minute: '2-digit'}).format(d) : NONE;
}

const STEPS = [['year', 31536000], ['month', 2592000], ['week', 604800], ['day', 86400], ['hour', 3600], ['minute', 60]];

export function relative(iso, now = Date.now()) {
    const d = toDate(iso);
    if (!d) {
        return NONE;
    }
    const seconds = (d.getTime() - now) / 1000;
    const words = new Intl.RelativeTimeFormat(locale, {numeric: 'auto'});
    for (const [unit, size] of STEPS) {
        if (Math.abs(seconds) >= size) {
            return words.format(Math.round(seconds / size), unit);
        }
    }
    return words.format(0, 'minute');
}

/** Today as yyyy-mm-dd in the user's own calendar (for date inputs). */
export function isoDay(offsetDays = 0) {
    const d = new Date();
    d.setDate(d.getDate() + offsetDays);
    return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-${String(d.getDate()).padStart(2, '0')}`;
}

/**
 * What a parts request is for, in words: its pump, else a kit top-up. A "pump down" request stored before one had to
 * name its pump (4 Dec 2026) says so rather than pass for a kit top-up: it was about a pump, only not which.
 */
export function requestFor(request) {
    if (request.assetId) {
        return `Pump ${request.assetId}`;
    }
    return request.urgency === 'PUMP_DOWN' ? 'Pump down, no pump named' : 'Kit top-up';
}
