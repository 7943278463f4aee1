/*
 * The spend page's results: a finished run's fan chart of yearly spend with its 80 % and 95 % ranges and the tables
 * per family and depot, finished runs side by side, and the back-check of past projections against what was spent.
 * Money here is projected: whole currency units with the currency, a range with the currency once.
 *   showResults(runId)                    draws a run's results (and keeps ?run=ID in the address)
 *   drawCompareChoices(runs, scenarios)   the finished runs to tick for comparing
 *   compare()                             the ticked runs side by side
 *   backCheck(currency)                   past projections against what was spent, in the catalogue's currency
 */
import {ready, api, fmt} from './lead.js';
import {h, mount, table, state} from '/app/js/ui.js';
import {fanChart, barChart, lineChart} from '/app/js/chart.js';

const runCard = document.getElementById('run-card');
const results = document.getElementById('results');
const whole = v => fmt.num(v, 0);
const money = (v, currency) => fmt.wholeMoney(v, currency);
const range = (low, high, currency) => `${money(low, currency)} – ${whole(high)}`;

/** A period by its dates: the first, months left in a financial year, by its months ("Dec 2026"), others by their year. */
const periodName = y => y.partial && y.months ? y.months : y.label;
const firstMonth = y => (y.months || y.label).split(' – ')[0];
const lastMonth = y => (y.months || y.label).split(' – ').pop();

function perGroupTable(caption, years, key, currency, id) {
    const names = [...new Set(years.flatMap(y => Object.keys(y[key] || {})))].sort();
    return table({caption, id, rows: names, columns: [{label: key === 'families' ? 'Component family' : 'Depot',
        value: n => key === 'families' ? fmt.family(n) : n},
        ...years.map(y => ({label: `${periodName(y)} (mean)`, num: true, value: n => money(y[key][n]?.mean, currency)})),
        ...years.map(y => ({label: `${periodName(y)} (80 % range)`, num: true,
            value: n => y[key][n] ? range(y[key][n].p10, y[key][n].p90, currency) : '–'}))]});
}

export async function showResults(runId) {
    const r = await api.get(`/api/spend/runs/${runId}/results`);
    history.replaceState(null, '', `?run=${runId}`);
    runCard.hidden = false;
    const years = r.years;
    const x = years.map(periodName);
    const total = years.reduce((s, y) => s + y.total.mean, 0);
    const first = years[0];
    mount(results,
        h('h3', {}, `${r.scenario}: run ${runId}`),
        h('p', {id: 'spend-span'}, `Expected parts spend from ${firstMonth(first)} to ${lastMonth(years[years.length - 1])}: `,
            h('strong', {id: 'spend-total'}, money(total, r.currency)), ` (${fmt.num(r.draws)} draws, seed ${r.seed}). `,
            `The first period, ${first.months || first.label}, holds the central store's one-time stock-up to the policy levels`,
            first.partial ? ' besides its own months\' parts' : '', '. Financial years start in ',
            new Intl.DateTimeFormat(undefined, {month: 'long'}).format(new Date(2026, r.financialYearStartMonth - 1, 15)), '.'),
        h('p', {class: 'row no-print'},
            h('a', {class: 'button', href: `/api/spend/runs/${runId}/report`, target: '_blank', rel: 'noopener'}, 'Printable report'),
            h('a', {class: 'button', href: `/api/spend/runs/${runId}/results.csv`, download: `spend-run-${runId}.csv`}, 'Download as CSV')),
        fanChart({title: `Parts spend a period, ${r.scenario} (${r.currency})`, x, xLabel: 'Period (financial years after the first)',
            yLabel: `Spend a year (${r.currency})`, centreName: 'Expected (mean)', centre: years.map(y => y.total.mean),
            range80: [years.map(y => y.total.p10), years.map(y => y.total.p90)],
            range95: [years.map(y => y.total.p2_5), years.map(y => y.total.p97_5)], format: whole, cell: v => money(v, r.currency)}),
        h('p', {class: 'hint'}, years.filter(y => periodName(y) !== y.months).map(y => `${y.label}: ${y.months}`).join('; '), '.'),
        perGroupTable(`Spend per component family (${r.currency})`, years, 'families', r.currency, 'spend-families'),
        perGroupTable(`Spend per depot (${r.currency})`, years, 'depots', r.currency, 'spend-depots'),
        // The run's notes say how the central store's stock-up is counted; the page adds only how the budget plan differs.
        r.notes?.length ? h('ul', {class: 'hint', id: 'spend-notes'}, r.notes.map(n => h('li', {}, n))) : null,
        h('p', {class: 'hint', id: 'central-store-note'}, 'The budget plan buys the same stock-up in whole packs, so it '
            + 'comes to a little more there.'));
    ready();
}

export function drawCompareChoices(runs, scenarios) {
    const done = runs.filter(r => r.status === 'DONE');
    const name = id => scenarios.find(s => s.id === id)?.name || `scenario ${id}`;
    mount(document.getElementById('compare-choices'), done.length ? done.map((r, i) => h('label', {},
        h('input', {type: 'checkbox', name: 'run', value: r.id, checked: i < 2 && done.findIndex(o => o.scenarioId === r.scenarioId) === i}),
        `${name(r.scenarioId)}, run ${r.id} (${fmt.date(r.finishedAt)})`)) : h('p', {class: 'empty'}, 'No finished run yet.'));
}

export async function compare() {
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

export async function backCheck(catalogueCurrency) {
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
