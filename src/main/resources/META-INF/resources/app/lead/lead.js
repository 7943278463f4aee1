/*
 * lead.js: what the programme lead's pages share: the page tabs, the start of each page (role check, top bar,
 * provenance line), following a run (forecast or spend) with a progress bar, and words for forecast methods.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, mount} from '/app/js/ui.js';
import {startPage} from '/app/js/nav.js';
import {provenance} from '/app/js/provenance.js';

const TABS = [
    ['/app/lead/', 'Forecasts'],
    ['/app/lead/budget.html', 'Budget plan'],
    ['/app/lead/spend.html', 'Spend'],
    ['/app/lead/settings.html', 'Service levels and lanes'],
    ['/app/lead/accuracy.html', 'Forecast accuracy']
];

export {METHOD_WORDS, methodWords} from '/app/js/methods.js';

function tabs() {
    const here = location.pathname.endsWith('/index.html') ? location.pathname.replace(/index\.html$/, '') : location.pathname;
    return h('nav', {class: 'tabs', 'aria-label': 'Programme lead pages'},
        TABS.map(([href, label]) => h('a', {href, 'aria-current': here === href ? 'page' : null}, label)));
}

/**
 * Starts a lead page: role check and top bar, tabs under the heading (for the lead), the provenance line when asked.
 * A page others may read too names their roles.
 */
export async function startLeadPage({withProvenance = true, roles = ['programme-lead']} = {}) {
    const me = await startPage({roles});
    if (me.roles.includes('programme-lead')) {
        document.querySelector('main h1').after(tabs());
    }
    let run = null;
    const line = document.getElementById('provenance');
    if (withProvenance && line) {
        run = await provenance(line, me);
    }
    return {me, run};
}

/** Marks the page ready once its data shows (tests and benchmarks wait for this). */
export function ready() {
    if (!document.body.dataset.ready) {
        performance.mark('depotcast-ready');
        document.body.dataset.ready = 'true';
    }
}

/**
 * Polls a run until it leaves RUNNING, drawing a labelled progress bar in `el`.
 * read(): the run now; progress(run) → {done, total, words}.
 */
export async function follow(el, label, read, progress, intervalMs = 700) {
    const bar = h('progress', {max: 1, value: 0, 'aria-label': label});
    const words = h('span', {class: 'run-words'}, 'Starting…');
    mount(el, h('div', {class: 'run-progress', role: 'status', 'aria-live': 'polite'}, h('p', {}, label, ': ', words), bar));
    let run = await read();
    while (run.status === 'RUNNING' || run.status === 'QUEUED') {
        const p = progress(run);
        if (p.total) {
            bar.max = p.total;
            bar.value = p.done;
        } else {
            bar.removeAttribute('value');
        }
        words.textContent = p.words;
        await new Promise(resolve => setTimeout(resolve, intervalMs));
        run = await read();
    }
    bar.max = 1;
    bar.value = run.status === 'DONE' ? 1 : 0;
    words.textContent = run.status === 'DONE' ? 'finished.' : `stopped: ${run.message || 'no reason given'}.`;
    return run;
}

export function monthLabel(iso) {
    return new Intl.DateTimeFormat(undefined, {month: 'short', year: 'numeric'}).format(new Date(`${iso}T12:00:00`));
}

export {api, fmt};
