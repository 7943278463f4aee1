/*
 * Spend: saved scenarios (edit, save as new: spend-editor.js), runs followed phase by phase, the fan chart of yearly
 * spend with its 80 % and 95 % ranges and the tables per family and depot, finished runs side by side, and the
 * back-check of past projections against what was actually spent (spend-results.js). ?run=ID reopens a run's results.
 */
import {startLeadPage, ready, follow, api, fmt} from './lead.js';
import {h, mount, table, state, busy, showError, say} from '/app/js/ui.js';
import {openEditor, edit} from './spend-editor.js';
import {showResults, drawCompareChoices, compare, backCheck} from './spend-results.js';

await startLeadPage();
const [models, depots, parts] = await Promise.all([api.get('/api/pump-models'), api.get('/api/locations', {kind: 'DEPOT'}),
    api.get('/api/parts')]);
const counts = {};
parts.forEach(p => counts[p.currency] = (counts[p.currency] || 0) + 1);
const catalogueCurrency = Object.entries(counts).sort((a, b) => b[1] - a[1])[0]?.[0] || 'USD';

const runCard = document.getElementById('run-card');
const results = document.getElementById('results');
let scenarios = [];
let runs = [];

const PHASES = ['queued', 'reading the fleet', 'simulating', 'summarising', 'done'];
const RUN_STATES = {RUNNING: ['running', 'info'], DONE: ['finished', 'ok'], FAILED: ['failed', 'urgent']};

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
    drawCompareChoices(runs, scenarios);
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

openEditor({models, depots, afterSave: loadList});
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
backCheck(catalogueCurrency);
