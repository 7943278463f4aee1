/*
 * provenance.js: the line every page with planning numbers shows: which forecast run they come from and when it
 * ran. Before the first run it says so and, for accounts that may, offers to start one and shows its progress.
 *   const run = await provenance(element, me)   → the run (or null when there is none yet)
 */
import * as api from './api.js';
import * as fmt from './format.js';
import {h, mount, busy} from './ui.js';

const MAY_RUN = ['stores-officer', 'programme-lead', 'admin'];

function month(iso) {
    return iso ? new Intl.DateTimeFormat(undefined, {month: 'short', year: 'numeric'}).format(new Date(`${iso}T12:00:00`)) : '';
}

export async function provenance(el, me) {
    const [run] = await api.get('/api/forecast/runs', {status: 'DONE', planning: true, limit: 1});
    if (run) {
        mount(el, `Planning numbers from forecast run ${run.id}, which finished ${fmt.dateTime(run.finishedAt)} `
            + `(${fmt.relative(run.finishedAt)})`, run.historyFrom ? `, using the repair history ${month(run.historyFrom)} – ${month(run.historyTo)}.` : '.');
        return run;
    }
    const start = h('button', {type: 'button', class: 'primary', onclick: () => busy(start, () => follow(el))}, 'Run the forecasts now');
    mount(el, h('div', {class: 'message'}, h('p', {}, 'No forecast has been run yet. Reorder points and alerts are '
        + 'worked out from the forecasts, so there are none to show.'),
        me && me.roles.some(r => MAY_RUN.includes(r)) ? h('p', {}, start, ' It takes about a minute on the demo programme.')
            : h('p', {}, 'Ask the programme lead to run the forecasts.')));
    return null;
}

async function follow(el) {
    let run = await api.post('/api/forecast/runs');
    const bar = h('progress', {max: 1, value: 0, 'aria-label': 'Forecast run progress'});
    const words = h('span', {}, 'Starting…');
    mount(el, h('div', {class: 'message'}, h('p', {}, `Forecast run ${run.id} is working: `, words), bar));
    while (run.status === 'RUNNING') {
        await new Promise(resolve => setTimeout(resolve, 1000));
        run = await api.get(`/api/forecast/runs/${run.id}`);
        if (run.seriesTotal) {
            bar.max = run.seriesTotal;
            bar.value = run.seriesDone;
            words.textContent = `${fmt.num(run.seriesDone)} of ${fmt.num(run.seriesTotal)} forecasts made.`;
        }
    }
    if (run.status !== 'DONE') {
        throw new Error(`The forecast run stopped without finishing: ${run.message || 'no reason given'}.`);
    }
    location.reload();
}
