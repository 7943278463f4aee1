/*
 * The programme lead's forecast page: start a forecast run and follow it, choose a part and place to see its forecast
 * (forecast-part.js) and a component family to see its fleet model (fleet-model.js).
 * The part and place shown are kept in the address (?part=…&location=…) so a link opens the same view.
 */
import {startLeadPage, ready, follow, monthLabel, api, fmt} from './lead.js';
import {h, mount, table, state, busy, showError, say} from '/app/js/ui.js';
import {provenance} from '/app/js/provenance.js';
import {partView} from './forecast-part.js';
import {fleetView} from './fleet-model.js';

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
    mount(explorer, partView(view, where, Number(document.getElementById('years').value)));
    ready();
}

const RUN_STATES = {RUNNING: ['running', 'info'], DONE: ['finished', 'ok'], FAILED: ['failed', 'urgent']};

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

async function showFleet() {
    const q = {depthM: fleetForm.depthM.value, hoursPerDay: fleetForm.hoursPerDay.value, ageYears: fleetForm.ageYears.value};
    mount(fleetBox, fleetView(await api.get(`/api/forecast/explorer/fleet-models/${familySelect.value}`, q)));
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
    mount(familySelect, models.map(m => h('option', {value: m.family}, `${fmt.family(m.family)}${m.source === 'fit' ? '' : ' (prior)'}`)));
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
