/*
 * The programme lead's forecast page: start a forecast run and follow it; one part's monthly history and 24-month
 * forecast with its 80 % and 95 % ranges, the method used and the scores it was chosen by; a family's fleet model.
 * The part and place shown are kept in the address (?part=…&location=…) so a link opens the same view.
 */
import {startLeadPage, ready, follow, methodWords, monthLabel, api, fmt} from './lead.js';
import {h, mount, table, figures, state, busy, showError, say} from '/app/js/ui.js';
import {lineChart} from '/app/js/chart.js';
import {provenance} from '/app/js/provenance.js';

const params = new URLSearchParams(location.search);
const {me} = await startLeadPage();
const [parts, locations] = await Promise.all([api.get('/api/parts'), api.get('/api/locations')]);
const partSelect = document.getElementById('part');
const locationSelect = document.getElementById('location');
const explorer = document.getElementById('explorer');


/**
 * Offers only the parts the latest run forecast at the chosen place (others are listed, disabled, as having none
 * there), and keeps the chosen part when it has one, else picks the part with the most demand expected there.
 */
async function partsForPlace() {
    const forecasts = await api.get(`/api/forecast/locations/${encodeURIComponent(locationSelect.value || 'PROGRAMME')}`);
    const expected = new Map(forecasts.map(f => [f.partNumber, f.forecast.length ? f.forecast[0].total : 0]));
    const wanted = partSelect.value || params.get('part');
    mount(partSelect, parts.map(p => h('option', {value: p.partNumber, disabled: !expected.has(p.partNumber)},
        `${p.partNumber} · ${p.description}${expected.has(p.partNumber) ? '' : ' (no forecast here)'}`)));
    const busiest = [...expected.entries()].sort((a, b) => b[1] - a[1])[0];
    partSelect.value = expected.has(wanted) ? wanted : busiest ? busiest[0] : '';
    return expected.size > 0;
}
const groups = [['CENTRAL_STORE', 'Central store'], ['DEPOT', 'District depots'], ['KIT', 'Mechanics\' kits']];
mount(locationSelect, h('option', {value: ''}, 'Whole programme'),
    groups.map(([kind, label]) => h('optgroup', {label}, locations.filter(l => l.kind === kind)
        .map(l => h('option', {value: l.code}, `${l.name} (${l.code})`)))));
locationSelect.value = params.get('location') || '';
locationSelect.addEventListener('change', () => partsForPlace().catch(e => showError(e)));

function num1(v) {
    return fmt.num(v, 1);
}

function scoreCell(v) {
    return v === null || v === undefined ? 'not scored' : fmt.num(v, 3);
}

function chart(view, yearsShown) {
    const f = view.forecast;
    const history = yearsShown > 0 ? f.history.slice(-12 * yearsShown) : f.history;
    const x = [...history.map(m => monthLabel(m.month)), ...f.forecast.map(m => monthLabel(m.month))];
    const pad = n => Array(n).fill(null);
    const nh = history.length;
    // The part's own unit word: a part counted in sets said "pieces" on the axis beside "sets" in the figures.
    const unit = unitWord(view.unitOfIssue) || (view.unitOfIssue || 'units').toLowerCase();
    return lineChart({
        title: `${view.partNumber} at ${view.location === 'PROGRAMME' ? 'the whole programme' : view.location}: used each month and forecast`,
        x, xLabel: 'Month', yLabel: `Units a month (${unit})`, format: num1,
        // The history is what breakdown repairs used; the forecast adds the scheduled services. Its breakdown part is
        // drawn too, so the step at the forecast's start is not read as demand jumping.
        series: [{name: 'Used in breakdown repairs', values: [...history.map(m => m.quantity), ...pad(f.forecast.length)]},
            {name: 'Forecast, breakdowns and services', dashed: true, values: [...pad(nh), ...view.ranges.map(r => r.mean)]},
            {name: 'Forecast, breakdowns only', dotted: true, values: [...pad(nh), ...f.forecast.map(m => m.breakdown)]}],
        bands: [{name: '95 % range', level: 95, lower: [...pad(nh), ...view.ranges.map(r => r.low95)], upper: [...pad(nh), ...view.ranges.map(r => r.high95)]},
            {name: '80 % range', level: 80, lower: [...pad(nh), ...view.ranges.map(r => r.low80)], upper: [...pad(nh), ...view.ranges.map(r => r.high80)]}],
        marker: {at: nh, label: 'forecast starts'}
    });
}

function howChosen(view) {
    const f = view.forecast;
    const hold = view.holdout;
    const holdText = hold.fleetRmsse === null || hold.fleetRmsse === undefined
        ? 'No fleet model covers this part here, so its own history is used.'
        : `For comparison only: over the last 12 months held out, the fleet model scored RMSSE ${fmt.num(hold.fleetRmsse, 3)} and `
          + `the part's own history RMSSE ${fmt.num(hold.historyRmsse, 3)} (lower is better). `
          + (hold.chosen === 'fleet model'
              // Said before the choice, so a lower history score beside "uses the fleet model" does not read as a slip.
              ? 'A part the fleet model covers takes the fleet rate, updated by its own history, whichever scored lower on '
                + 'one held-out year. The forecast uses the fleet model' + (f.methodDetail && f.methodDetail !== 'fleet model' ? `: ${f.methodDetail}.` : '.')
              : `The forecast uses the part's own history (${methodWords(f.method)}).`);
    return h('div', {class: 'method-box'},
        h('h3', {}, 'How the method was chosen'),
        h('p', {}, 'Used: ', h('strong', {}, methodWords(f.method)),
            f.alpha !== null && f.alpha !== undefined ? ` (α ${fmt.num(f.alpha, 2)}${f.beta !== null && f.beta !== undefined ? `, β ${fmt.num(f.beta, 2)}` : ''})` : '', '.'),
        h('p', {}, holdText),
        table({caption: 'History methods scored on this part\'s history', rows: view.historyMethods,
            empty: 'Too little history to score the methods against each other (fewer than 18 months or fewer than two demands).',
            columns: [{label: 'Method', value: m => methodWords(m.method)},
                {label: 'MASE', num: true, value: m => scoreCell(m.mase)},
                {label: 'RMSSE', num: true, value: m => scoreCell(m.rmsse)},
                {label: 'Bias (scaled)', num: true, value: m => scoreCell(m.scaledBias)},
                {label: 'In use', value: m => m.chosen ? state('used', 'ok') : state('not used', 'quiet')}]}),
        h('p', {class: 'hint'}, view.backtestBasis, ' ', view.holdout.basis),
        h('details', {}, h('summary', {}, 'How the ranges are worked out'), h('p', {}, view.intervalModel)));
}

async function showPart(push = true) {
    const part = partSelect.value;
    const where = locationSelect.value;
    if (!part) {
        mount(explorer, h('p', {}, 'The latest run has no forecast of any part at this place.'));
        return;
    }
    if (push) {
        const q = new URLSearchParams({part});
        if (where) {
            q.set('location', where);
        }
        history.replaceState(null, '', `?${q}`);
    }
    mount(explorer, h('p', {class: 'loading'}, 'Drawing the forecast…'));
    const view = await api.get(`/api/forecast/explorer/parts/${encodeURIComponent(part)}`, {location: where});
    const f = view.forecast;
    const next12 = view.ranges.slice(0, 12).reduce((s, r) => s + r.mean, 0);
    const whole = fmt.wholeUnits(view.unitOfIssue);
    mount(explorer,
        h('h3', {}, `${view.partNumber} · ${view.description}`, h('span', {class: 'muted'}, ` at ${where ? where : 'the whole programme'}`)),
        figures([
            ['Method used', methodWords(f.method)],
            ['Expected next month', `${fmt.num(view.ranges[0].mean, whole ? 1 : 2)} ${unitWord(view.unitOfIssue)}`],
            ['Expected next 12 months', fmt.qty(next12, view.unitOfIssue)],
            ['Next month, 80 % range', `${fmt.qty(view.ranges[0].low80, view.unitOfIssue)} to ${fmt.qty(view.ranges[0].high80, view.unitOfIssue)}`],
            ['Demand pattern', f.demandClass ? f.demandClass.replace(/_/g, ' ').toLowerCase() : '–'],
            ['Months between demands (ADI)', fmt.num(f.adi, 2)]
        ]),
        chart(view, Number(document.getElementById('years').value)),
        f.forecast.length && f.forecast[0].preventive > 0 ? h('p', {class: 'hint', id: 'history-note'}, 'The solid line counts '
            + `the parts breakdown repairs used; the forecast adds the scheduled services: next month ${fmt.num(f.forecast[0].preventive, 1)} `
            + `of the ${fmt.num(f.forecast[0].total, 1)} expected are for services.`) : null,
        howChosen(view));
    ready();
}

const RUN_STATES = {RUNNING: ['running', 'info'], DONE: ['finished', 'ok'], FAILED: ['failed', 'urgent']};

function unitWord(unit) {
    return fmt.qty(2, unit).replace(/^[\d.,\s]+/, '');
}

/** The account that started a run, the nightly schedule, or (runs older than the record) "not recorded". */
function startedBy(r) {
    const who = r.trigger === 'schedule' ? 'the nightly schedule' : r.startedBy || 'not recorded';
    return r.trigger === 'as-of' ? `${who}, for an accuracy check as of ${monthLabel(r.origin)}` : who;
}

async function showRuns() {
    const runs = await api.get('/api/forecast/runs', {limit: 5});
    mount(document.getElementById('runs'), table({caption: 'Recent forecast runs', rows: runs, empty: 'No forecast run yet.',
        columns: [{label: 'Run', num: true, value: r => String(r.id)},
            {label: 'State', value: r => state(...(RUN_STATES[r.status] || [r.status, 'quiet']))},
            {label: 'Started by', value: startedBy},
            {label: 'Started', value: r => fmt.dateTime(r.startedAt)},
            {label: 'Finished', value: r => fmt.dateTime(r.finishedAt)},
            {label: 'Forecasts made', num: true, value: r => r.seriesTotal ? `${fmt.num(r.seriesDone)} of ${fmt.num(r.seriesTotal)}` : '–'},
            {label: 'History used', value: r => r.historyFrom ? `${monthLabel(r.historyFrom)} – ${monthLabel(r.historyTo)}` : '–'}]}));
    return runs;
}

async function startRun() {
    let run;
    try {
        run = await api.post('/api/forecast/runs');
    } catch (e) {
        if (e.status !== 409) {
            throw e;
        }
        [run] = await api.get('/api/forecast/runs', {status: 'RUNNING', limit: 1});
        if (!run) {
            throw e;
        }
        say(`Forecast run ${run.id} was already working; following it.`, 'info');
    }
    const done = await follow(document.getElementById('run-progress'), `Forecast run ${run.id}`,
        () => api.get(`/api/forecast/runs/${run.id}`),
        r => ({done: r.seriesDone, total: r.seriesTotal,
            words: r.seriesTotal ? `${fmt.num(r.seriesDone)} of ${fmt.num(r.seriesTotal)} forecasts made` : 'reading the fleet and the repair history…'}));
    await showRuns();
    if (done.status === 'DONE') {
        await provenance(document.getElementById('provenance'), me);
        say(`Forecast run ${done.id} finished. The numbers on these pages now come from it.`, 'ok');
        await Promise.all([loadFamilies(), partsForPlace()]);
        await Promise.all([showPart(false), showFleet()]);
    } else {
        say(`Forecast run ${done.id} stopped without finishing: ${done.message || 'no reason given'}.`, 'error');
    }
}

const fleetBox = document.getElementById('fleet');
const fleetForm = document.getElementById('fleet-form');
const familySelect = document.getElementById('family');

function familyWords(f) {
    return f.replace(/_/g, ' ').toLowerCase();
}

async function showFleet() {
    const q = {depthM: fleetForm.depthM.value, hoursPerDay: fleetForm.hoursPerDay.value, ageYears: fleetForm.ageYears.value};
    const view = await api.get(`/api/forecast/explorer/fleet-models/${familySelect.value}`, q);
    const fit = view.fit;
    const ref = view.reference;
    const refWords = `a pump ${fmt.num(ref.ageYears, 1)} years old`;
    const perYear = v => fmt.num(v, 2);
    mount(fleetBox,
        figures([
            ['Model', fit.source === 'fit' ? 'fitted on the fleet' : 'declared prior (too few breakdowns)'],
            ['Breakdowns in the fit', fmt.num(fit.events)],
            ['Operating hours in the fit', fmt.num(fit.exposureHours)],
            ['Units replaced per breakdown', fmt.num(fit.unitsPerEvent, 2)],
            ['Breakdowns per 1,000 hours (new pump, 30 m)', fmt.num(fit.eventsPer1000Hours, 3)],
            ['Spread', fit.dispersion === null ? '–' : `${fit.overdispersed ? 'overdispersed' : 'as Poisson'} (χ²/df ${fmt.num(fit.dispersion, 2)})`]
        ]),
        h('p', {class: 'hint'}, view.note),
        lineChart({title: `Breakdowns per pump-year against depth (${refWords}, used ${fmt.num(ref.hoursPerDay, 1)} hours a day)`,
                x: view.byDepth.map(p => `${fmt.num(p.value)} m`), xLabel: 'Borehole depth (metres)', yLabel: 'Breakdowns per pump-year',
                format: perYear, series: [{name: 'Breakdowns per pump-year', values: view.byDepth.map(p => p.breakdownsPerPumpYear)},
                    {name: 'Units used per pump-year', dashed: true, values: view.byDepth.map(p => p.unitsPerPumpYear)}]}),
            lineChart({title: `Breakdowns per pump-year against daily use (${refWords}, ${fmt.num(ref.depthM)} m deep)`,
                x: view.byDailyUse.map(p => `${fmt.num(p.value)} h`), xLabel: 'Daily use (hours a day)', yLabel: 'Breakdowns per pump-year',
                format: perYear, series: [{name: 'Breakdowns per pump-year', values: view.byDailyUse.map(p => p.breakdownsPerPumpYear)},
                    {name: 'Units used per pump-year', dashed: true, values: view.byDailyUse.map(p => p.unitsPerPumpYear)}]}),
        table({caption: `Coefficients of the ${familyWords(fit.family)} model, with 95 % intervals`, rows: view.terms,
            columns: [{label: 'Term', value: t => t.name.replace(/_/g, ' ')},
                {label: 'Meaning', value: t => t.words},
                {label: 'Estimate', num: true, value: t => fmt.num(t.estimate, 3)},
                {label: '95 % interval', num: true, value: t => t.low95 === null || t.low95 === undefined ? 'none (prior)' : `${fmt.num(t.low95, 3)} to ${fmt.num(t.high95, 3)}`},
                {label: 'Rate ratio', num: true, value: t => t.name === 'intercept' ? '–' : fmt.num(t.rateRatio, 3)},
                {label: 'Rate ratio, 95 %', num: true, value: t => t.name === 'intercept' || t.rateRatioLow95 === null || t.rateRatioLow95 === undefined
                    ? '–' : `${fmt.num(t.rateRatioLow95, 3)} to ${fmt.num(t.rateRatioHigh95, 3)}`}]}));
}

document.getElementById('start-run').addEventListener('click', e => busy(e.currentTarget, startRun));
document.getElementById('explore-form').addEventListener('submit', e => {
    e.preventDefault();
    busy(e.submitter || e.target.querySelector('button'), () => showPart(), e.target);
});
fleetForm.addEventListener('submit', e => {
    e.preventDefault();
    busy(e.submitter || e.target.querySelector('button'), showFleet, fleetForm);
});

async function loadFamilies() {
    const chosen = familySelect.value || params.get('family');
    const models = await api.get('/api/forecast/explorer/fleet-models');
    mount(familySelect, models.map(m => h('option', {value: m.family}, `${familyWords(m.family)}${m.source === 'fit' ? '' : ' (prior)'}`)));
    if (chosen && models.some(m => m.family === chosen)) {
        familySelect.value = chosen;
    }
}

await showRuns();
// A run as of a past date (an accuracy check) is never the one the pages read from; asked for apart, since a few
// checks in a row pushed the planning run out of the recent five and the page said there was no forecast.
const planningRuns = await api.get('/api/forecast/runs', {status: 'DONE', planning: true, limit: 1});
if (planningRuns.length) {
    await Promise.all([loadFamilies(), partsForPlace()]);
    await Promise.all([showPart(false).catch(e => showError(e)), showFleet().catch(e => showError(e))]);
} else {
    mount(explorer, h('p', {}, 'No forecast yet: run the forecasts first.'));
}
ready();
