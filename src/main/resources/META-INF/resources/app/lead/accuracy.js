/*
 * "How good were the forecasts?": the lead (or an admin) starts an accuracy check for a past origin and follows its
 * progress; whoever may read programme-wide figures (the lead, officers of the central store, admins) reads it and
 * the earlier checks. ?report=ID opens one; without it the newest check shows.
 */
import {startLeadPage, ready, follow, api, fmt, monthLabel} from './lead.js';
import {h, mount, table, state, busy, showError, say} from '/app/js/ui.js';
import {showReport} from './accuracy-view.js';

const REPORTS = '/api/forecast/accuracy-reports';
const TONES = {RUNNING: 'info', DONE: 'ok', FAILED: 'urgent'};

const {me} = await startLeadPage({withProvenance: false, roles: ['programme-lead', 'stores-officer', 'admin']});
const mayStart = me.roles.includes('programme-lead') || me.roles.includes('admin');
const form = document.getElementById('check-form');
const reportCard = document.getElementById('report-card');
const reportBox = document.getElementById('report');

/** The first day of the month `monthsBack` months before this one, in the user's own calendar. */
function monthStart(monthsBack) {
    const now = new Date();
    const d = new Date(now.getFullYear(), now.getMonth() - monthsBack, 1);
    return `${d.getFullYear()}-${String(d.getMonth() + 1).padStart(2, '0')}-01`;
}

async function readReport(id) {
    const report = await api.get(`${REPORTS}/${id}`);
    // follow() in lead.js reads a run's status and message.
    return Object.assign(report, {status: report.job.state, message: report.job.message});
}

async function openReport(id) {
    history.replaceState(null, '', `?report=${id}`);
    reportCard.hidden = false;
    mount(reportBox, h('p', {class: 'loading'}, 'Reading the check…'));
    let report = await readReport(id);
    if (report.status === 'RUNNING') {
        const where = mayStart ? document.getElementById('check-progress') : reportBox;
        report = await follow(where, `Checking the 12 months from ${monthLabel(report.origin)}`, () => readReport(id),
            r => ({done: r.job.progressDone, total: r.job.progressTotal, words: r.job.phase || 'working'}));
        await listEarlier();
    }
    showReport(reportBox, report, `${REPORTS}/${id}/rows.csv`);
}

async function listEarlier() {
    const reports = await api.get(REPORTS, {limit: 50});
    mount(document.getElementById('earlier'), table({caption: 'Checks made, newest first', id: 'earlier-table', rows: reports,
        empty: mayStart ? 'No check has been made yet: start one above.' : 'No check has been made yet.',
        columns: [{label: 'Months checked', value: r => h('a', {href: `?report=${r.id}`}, `12 months from ${monthLabel(r.origin)}`)},
            {label: 'Started', value: r => `${fmt.dateTime(r.createdAt)} by ${r.createdBy}`},
            {label: 'State', value: r => state(r.job.stateWords, TONES[r.job.state] || 'quiet')},
            {label: 'Finished', value: r => fmt.dateTime(r.job.finishedAt)}]}));
    return reports;
}

if (mayStart) {
    document.getElementById('check-card').hidden = false;
    const latest = monthStart(12);
    form.origin.value = latest;
    form.origin.max = latest;
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(e.submitter || form.querySelector('button'), async () => {
            if (!form.origin.value) {
                throw {errors: [{field: 'origin', message: `choose a day on or before ${fmt.date(latest)}`}], detail: 'No check was started.'};
            }
            let started;
            try {
                started = await api.post(api.query(REPORTS, {origin: form.origin.value}));
            } catch (e) {
                // One check runs at a time: when another is under way, follow it instead of only refusing.
                const running = e.status === 409 ? (await listEarlier()).find(r => r.job.state === 'RUNNING') : null;
                if (!running) {
                    throw e;
                }
                say(`A check of the 12 months from ${monthLabel(running.origin)} is already running; it is shown below. `
                    + 'Start yours when it has finished.', 'info');
                started = running;
            }
            await listEarlier();
            await openReport(started.id);
        }, form);
    });
}

// A depot's officer may open the page but not the programme's figures: said in words instead of a bare refusal.
const reports = await listEarlier().catch(e => {
    if (!e.refused) {
        throw e;
    }
    mount(document.getElementById('earlier'), h('p', {class: 'message message--error'}, 'These checks cover the whole '
        + 'programme, so they are for the programme lead, officers of the central store and administrators.'));
    return [];
});
const asked = Number(new URLSearchParams(location.search).get('report'));
const shown = Number.isInteger(asked) && asked > 0 ? asked : reports[0]?.id;
if (shown) {
    // A running check is followed in the background so the page shows what it has meanwhile.
    const opening = openReport(shown).catch(e => showError(e)).then(ready);
    if ((reports.find(r => r.id === shown)?.job.state || 'DONE') !== 'RUNNING') {
        await opening;
    }
}
ready();
