/*
 * Spend: saved scenarios (edit, save as new), runs followed phase by phase, the fan chart of yearly spend with its
 * 80 % and 95 % ranges and the tables per family and depot, finished runs side by side, and the back-check of past
 * projections against what was actually spent. ?run=ID reopens a run's results.
 */
import {startLeadPage, ready, follow, api, fmt} from './lead.js';
import {h, mount, table, state, busy, showError, say, clearErrors} from '/app/js/ui.js';
import {fanChart, barChart, lineChart} from '/app/js/chart.js';

await startLeadPage();
const [models, depots, parts] = await Promise.all([api.get('/api/pump-models'), api.get('/api/locations', {kind: 'DEPOT'}),
    api.get('/api/parts')]);
const counts = {};
parts.forEach(p => counts[p.currency] = (counts[p.currency] || 0) + 1);
const catalogueCurrency = Object.entries(counts).sort((a, b) => b[1] - a[1])[0]?.[0] || 'USD';

const form = document.getElementById('scenario-form');
const editorCard = document.getElementById('editor-card');
const installBox = document.getElementById('installations');
const runCard = document.getElementById('run-card');
const results = document.getElementById('results');
let editing = null;
let scenarios = [];
let runs = [];

const PHASES = ['queued', 'reading the fleet', 'simulating', 'summarising', 'done'];
const RUN_STATES = {RUNNING: ['running', 'info'], DONE: ['finished', 'ok'], FAILED: ['failed', 'urgent']};
const whole = v => fmt.num(v, 0);
// Money on this page is projected: whole currency units with the currency, a range with the currency once.
const money = (v, currency) => fmt.wholeMoney(v, currency);
const range = (low, high, currency) => `${money(low, currency)} – ${whole(high)}`;

function changes(d) {
    const said = [];
    const installs = (d.installations || []).reduce((s, i) => s + i.count, 0);
    if (installs) {
        said.push(`${fmt.num(installs)} new pumps`);
    }
    if (d.decommissionPercentPerYear) {
        said.push(`${fmt.num(d.decommissionPercentPerYear, 1)} % out of service a year`);
    }
    if (d.usageChangePercent) {
        said.push(`use ${d.usageChangePercent > 0 ? '+' : ''}${fmt.num(d.usageChangePercent, 1)} %`);
    }
    if (d.priceEscalationPercentPerYear) {
        said.push(`prices ${d.priceEscalationPercentPerYear > 0 ? '+' : ''}${fmt.num(d.priceEscalationPercentPerYear, 1)} % a year`);
    }
    if (d.currency) {
        said.push(`in ${d.currency}`);
    }
    return said.length ? said.join('; ') : 'today\'s fleet, use and prices';
}

async function loadList() {
    [scenarios, runs] = await Promise.all([api.get('/api/spend/scenarios'), api.get('/api/spend/runs', {limit: 100})]);
    const latest = id => runs.find(r => r.scenarioId === id);
    mount(document.getElementById('scenario-list'), table({caption: 'Saved scenarios', id: 'scenarios', rows: scenarios,
        empty: 'No scenario yet: make one with "New scenario".',
        columns: [{label: 'Scenario', value: s => s.name},
            {label: 'Years', num: true, value: s => fmt.num(s.definition.horizonYears)},
            {label: 'What changes', value: s => changes(s.definition)},
            {label: 'Latest run', value: s => {
                const r = latest(s.id);
                return r ? h('span', {}, state(...(RUN_STATES[r.status] || [r.status, 'quiet'])), ` run ${r.id}, ${fmt.relative(r.startedAt)}`) : 'not run yet';
            }},
            {label: 'Actions', value: s => h('div', {class: 'row'},
                h('button', {type: 'button', 'data-run': s.id, onclick: e => busy(e.currentTarget, () => runScenario(s))}, `Run ${s.name}`),
                h('button', {type: 'button', onclick: () => edit(s)}, `Edit ${s.name}`),
                latest(s.id)?.status === 'DONE' ? h('button', {type: 'button', onclick: e => busy(e.currentTarget, () => showResults(latest(s.id).id))},
                    `Results of ${s.name}`) : null)}]}));
    drawCompareChoices();
}

function installationRow(i = {}) {
    const row = h('div', {class: 'installation-row'});
    const field = (name, label, input) => {
        input.id = `inst-${Math.random().toString(36).slice(2)}`;
        input.dataset.name = name;
        return h('div', {}, h('label', {for: input.id}, label), input);
    };
    row.append(
        field('year', 'Year (1 = first)', h('input', {type: 'number', min: 1, max: 10, step: 1, value: i.year ?? 1, required: true})),
        field('count', 'Pumps', h('input', {type: 'number', min: 0, max: 100000, step: 1, value: i.count ?? 10, required: true})),
        field('modelCode', 'Pump model', h('select', {}, models.map(m => h('option', {value: m.code, selected: m.code === i.modelCode}, `${m.code} · ${m.name}`)))),
        field('depthM', 'Depth (m)', h('input', {type: 'number', min: 1, step: 1, value: i.depthM ?? 40, required: true})),
        field('usageHoursPerDay', 'Hours a day', h('input', {type: 'number', min: 0, max: 24, step: 0.5, value: i.usageHoursPerDay ?? ''})),
        field('depotCode', 'Depot', h('select', {}, depots.map(d => h('option', {value: d.code, selected: d.code === i.depotCode}, d.name)))),
        h('div', {}, h('button', {type: 'button', class: 'danger', onclick: () => {
            row.remove();
            numberRows();
        }}, 'Remove')));
    return row;
}

function numberRows() {
    [...installBox.children].forEach((row, n) => row.querySelectorAll('[data-name]')
        .forEach(input => input.dataset.field = `installations[${n}].${input.dataset.name}`));
}

function edit(s) {
    editing = s;
    clearErrors(form);
    const d = s ? s.definition : {horizonYears: 5, draws: 10000};
    for (const name of ['name', 'horizonYears', 'decommissionPercentPerYear', 'usageChangePercent', 'priceEscalationPercentPerYear',
        'currency', 'exchangeRate', 'serviceLevel', 'draws']) {
        form.elements[name].value = d[name] ?? '';
    }
    // The page asks per cent, as the settings page does; the API keeps a fraction.
    form.elements.serviceLevel.value = d.serviceLevel == null ? '' : Number((d.serviceLevel * 100).toFixed(2));
    mount(installBox, (d.installations || []).map(installationRow));
    numberRows();
    document.getElementById('editor-heading').textContent = s ? `Scenario: ${s.name}` : 'New scenario';
    document.getElementById('save-scenario').textContent = s ? 'Save the changes' : 'Save the scenario';
    document.getElementById('save-as-new').hidden = !s;
    editorCard.hidden = false;
    form.elements.name.focus();
}

const NOT_SAVED = 'The scenario was not saved: correct what is said beside each field marked below.';

/**
 * The per-cent figure as the API's fraction (rounded: 99.9 / 100 is 0.9990000000000001, past the API's 0.999).
 * Checked here in per cent: the API's bounds are a fraction's, and 0.2 typed would be a 20 % level.
 */
function levelOrNull(percent) {
    if (percent === null) {
        return null;
    }
    if (!(percent >= 50 && percent <= 99.9)) {
        throw {errors: [{field: 'serviceLevel', message: 'enter a level in per cent, from 50 to 99.9 (e.g. 95)'}],
            detail: NOT_SAVED};
    }
    return Number((percent / 100).toFixed(6));
}

function definition() {
    const numberOrNull = name => form.elements[name].value === '' ? null : Number(form.elements[name].value);
    return {
        name: form.elements.name.value.trim(), horizonYears: numberOrNull('horizonYears'),
        decommissionPercentPerYear: numberOrNull('decommissionPercentPerYear'), usageChangePercent: numberOrNull('usageChangePercent'),
        priceEscalationPercentPerYear: numberOrNull('priceEscalationPercentPerYear'),
        currency: form.elements.currency.value.trim().toUpperCase() || null, exchangeRate: numberOrNull('exchangeRate'),
        serviceLevel: levelOrNull(numberOrNull('serviceLevel')), draws: numberOrNull('draws'),
        installations: [...installBox.children].map(row => {
            const value = name => row.querySelector(`[data-name="${name}"]`).value;
            return {year: Number(value('year')), count: Number(value('count')), modelCode: value('modelCode'),
                depthM: Number(value('depthM')), usageHoursPerDay: value('usageHoursPerDay') === '' ? null : Number(value('usageHoursPerDay')),
                depotCode: value('depotCode')};
        })
    };
}

async function save(asNew) {
    const body = definition();
    let saved;
    try {
        saved = editing && !asNew ? await api.put(`/api/spend/scenarios/${editing.id}`, body)
            : await api.post('/api/spend/scenarios', body);
    } catch (e) {
        // The API's detail names fields ("currency: …"); each one is said beside its input, so the top line is words.
        throw e.errors?.length && !e.refused && !e.offline ? Object.assign(e, {detail: NOT_SAVED}) : e;
    }
    say(`Scenario "${saved.name}" saved.`, 'ok');
    editorCard.hidden = true;
    editing = null;
    await loadList();
}

async function runScenario(s) {
    const started = await api.post(`/api/spend/scenarios/${s.id}/runs`);
    runCard.hidden = false;
    mount(results);
    runCard.scrollIntoView({block: 'start'});
    const run = await follow(document.getElementById('spend-progress'), `Spend run ${started.id} of "${s.name}"`,
        () => api.get(`/api/spend/runs/${started.id}`),
        r => {
            const step = PHASES.findIndex(p => (r.phase || '').startsWith(p));
            return {done: Math.max(0, step), total: PHASES.length - 1, words: r.phase || 'queued'};
        }, 500);
    await loadList();
    if (run.status !== 'DONE') {
        say(`Spend run ${run.id} stopped: ${run.message || 'no reason given'}.`, 'error');
        return;
    }
    await showResults(run.id);
}

function perGroupTable(caption, years, key, currency, id) {
    const names = [...new Set(years.flatMap(y => Object.keys(y[key] || {})))].sort();
    return table({caption, id, rows: names, columns: [{label: key === 'families' ? 'Component family' : 'Depot',
        value: n => key === 'families' ? n.replace(/_/g, ' ').toLowerCase() : n},
        ...years.map(y => ({label: `${y.label} (mean)`, num: true, value: n => money(y[key][n]?.mean, currency)})),
        ...years.map(y => ({label: `${y.label} (80 % range)`, num: true,
            value: n => y[key][n] ? range(y[key][n].p10, y[key][n].p90, currency) : '–'}))]});
}

async function showResults(runId) {
    const r = await api.get(`/api/spend/runs/${runId}/results`);
    history.replaceState(null, '', `?run=${runId}`);
    runCard.hidden = false;
    const years = r.years;
    const x = years.map(y => y.partial ? `${y.label} (part)` : y.label);
    const total = years.reduce((s, y) => s + y.total.mean, 0);
    mount(results,
        h('h3', {}, `${r.scenario}: run ${runId}`),
        h('p', {}, `Expected parts spend over the ${years.length} periods: `, h('strong', {id: 'spend-total'}, money(total, r.currency)),
            ` (${fmt.num(r.draws)} draws, seed ${r.seed}). Financial years start in `,
            new Intl.DateTimeFormat(undefined, {month: 'long'}).format(new Date(2026, r.financialYearStartMonth - 1, 15)), '.'),
        h('p', {class: 'row no-print'},
            h('a', {class: 'button', href: `/api/spend/runs/${runId}/report`, target: '_blank', rel: 'noopener'}, 'Printable report'),
            h('a', {class: 'button', href: `/api/spend/runs/${runId}/results.csv`, download: `spend-run-${runId}.csv`}, 'Download as CSV')),
        fanChart({title: `Parts spend a financial year, ${r.scenario} (${r.currency})`, x, xLabel: 'Financial year',
            yLabel: `Spend a year (${r.currency})`, centreName: 'Expected (mean)', centre: years.map(y => y.total.mean),
            range80: [years.map(y => y.total.p10), years.map(y => y.total.p90)],
            range95: [years.map(y => y.total.p2_5), years.map(y => y.total.p97_5)], format: whole, cell: v => money(v, r.currency)}),
        h('p', {class: 'hint'}, years.map(y => `${y.label}: ${y.months}`).join('; '), '.'),
        perGroupTable(`Spend per component family (${r.currency})`, years, 'families', r.currency, 'spend-families'),
        perGroupTable(`Spend per depot (${r.currency})`, years, 'depots', r.currency, 'spend-depots'),
        h('p', {class: 'hint', id: 'central-store-note'}, 'The central store buys once, in the first period, the stock that '
            + 'brings the programme up to its policy levels; after that each year\'s parts are counted at the depot whose '
            + 'pumps use them, so the central store shows no spend in later years. The budget plan buys the same stock '
            + 'in whole packs, so it comes to a little more there.'),
        r.notes?.length ? h('ul', {class: 'hint'}, r.notes.map(n => h('li', {}, n))) : null);
    ready();
}

function drawCompareChoices() {
    const done = runs.filter(r => r.status === 'DONE');
    const name = id => scenarios.find(s => s.id === id)?.name || `scenario ${id}`;
    mount(document.getElementById('compare-choices'), done.length ? done.map((r, i) => h('label', {},
        h('input', {type: 'checkbox', name: 'run', value: r.id, checked: i < 2 && done.findIndex(o => o.scenarioId === r.scenarioId) === i}),
        `${name(r.scenarioId)}, run ${r.id} (${fmt.date(r.finishedAt)})`)) : h('p', {class: 'empty'}, 'No finished run yet.'));
}

async function compare() {
    const ids = [...document.querySelectorAll('#compare-choices input:checked')].map(i => i.value);
    if (ids.length < 1) {
        throw Object.assign(new Error('Tick at least one finished run.'), {errors: []});
    }
    const rows = await api.get('/api/spend/compare', {runs: ids.join(',')});
    const base = rows[0];
    const same = rows.filter(r => r.currency === base.currency);
    const labels = base.years.map(y => y.financialYear);
    mount(document.getElementById('compare'),
        barChart({title: `Expected parts spend a financial year (${base.currency})`, x: labels, xLabel: 'Financial year',
            yLabel: `Spend a year (${base.currency})`, format: whole, cell: v => money(v, base.currency),
            series: same.map(r => ({name: r.scenario, values: labels.map(l => r.years.find(y => y.financialYear === l)?.total.mean ?? null)}))}),
        table({caption: 'Scenarios side by side', id: 'compare-table', rows,
            columns: [{label: 'Scenario', value: r => r.scenario},
                ...labels.map(l => ({label: l, num: true, value: r => {
                    const y = r.years.find(o => o.financialYear === l);
                    if (!y) {
                        return '–';
                    }
                    const diff = y.differenceFromBaseline;
                    return h('span', {}, money(y.total.mean, r.currency),
                        r !== base && diff !== null && diff !== undefined ? h('span', {class: 'hint'}, `${diff >= 0 ? '+' : '−'}${money(Math.abs(diff), r.currency)} against ${base.scenario}`) : null);
                }})),
                {label: 'All years', num: true, value: r => money(r.expectedTotal, r.currency)},
                {label: 'Note', value: r => r.note || (r === base ? 'baseline' : '')}]}));
}

async function backCheck() {
    const box = document.getElementById('back-check');
    try {
        const years = await api.get('/api/spend/back-check', {years: 3});
        const x = years.map(y => y.label);
        mount(box,
            lineChart({title: `Projected against actually spent, past financial years (${catalogueCurrency})`, x, xLabel: 'Financial year',
                yLabel: `Spend a year (${catalogueCurrency})`, format: whole, cell: v => money(v, catalogueCurrency),
                series: [{name: 'Projected (mean)', dashed: true, values: years.map(y => y.projectedMean)},
                    {name: 'Actually spent', values: years.map(y => y.actual)}],
                bands: [{name: 'Projected 95 % range', level: 95, lower: years.map(y => y.projectedP2_5), upper: years.map(y => y.projectedP97_5)},
                    {name: 'Projected 80 % range', level: 80, lower: years.map(y => y.projectedP10), upper: years.map(y => y.projectedP90)}]}),
            h('ul', {id: 'back-check-words'}, years.map(y => h('li', {}, `${y.label} (${y.months}): spent ${money(y.actual, catalogueCurrency)}, `,
                y.within80 ? state('inside the 80 % range', 'ok') : y.within95 ? state('inside the 95 % range only', 'warn')
                    : state('outside the 95 % range', 'urgent')))));
    } catch (e) {
        mount(box, h('p', {}, `The back-check could not be worked out: ${e.detail || e.message}`));
    }
}

document.getElementById('new-scenario').addEventListener('click', () => edit(null));
document.getElementById('add-installation').addEventListener('click', () => {
    installBox.append(installationRow());
    numberRows();
});
document.getElementById('close-editor').addEventListener('click', () => {
    editorCard.hidden = true;
    editing = null;
});
form.addEventListener('submit', e => {
    e.preventDefault();
    busy(document.getElementById('save-scenario'), () => save(false), form);
});
document.getElementById('save-as-new').addEventListener('click', e => busy(e.currentTarget, () => save(true), form));
document.getElementById('compare-form').addEventListener('submit', e => {
    e.preventDefault();
    busy(e.submitter || e.target.querySelector('button'), compare);
});

await loadList();
const reopen = new URLSearchParams(location.search).get('run');
if (reopen) {
    await showResults(reopen).catch(e => showError(e));
}
ready();
backCheck();
