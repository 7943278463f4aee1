/*
 * The lead's settings: service level per part class, how sure the sensors must be before a pump is called probably
 * down, the financial year's first month, transport cost per lane.
 */
import {startLeadPage, ready, api, fmt} from './lead.js';
import {h, mount, table, busy, say, state} from '/app/js/ui.js';

await startLeadPage();
const counts = {};
(await api.get('/api/parts')).forEach(p => counts[p.currency] = (counts[p.currency] || 0) + 1);
const currency = Object.entries(counts).sort((a, b) => b[1] - a[1])[0]?.[0] || 'USD';

function levelForm(partClass, words, level, defaultLevel) {
    const id = `level-${partClass.toLowerCase()}`;
    const form = h('form', {class: 'card', id: `${id}-form`, novalidate: true},
        h('h3', {}, words),
        h('label', {for: id}, 'Cycle service level', h('span', {class: 'hint'}, `per cent, 50 to 99.9; configured default ${fmt.num(defaultLevel * 100, 1)} %`)),
        h('input', {id, name: 'level', type: 'number', min: 50, max: 99.9, step: 0.1, value: Number((level * 100).toFixed(2))}),
        h('p', {}, 'In force now: ', h('strong', {class: 'in-force'}, `${fmt.num(level * 100, 1)} %`)),
        h('button', {type: 'submit', class: 'primary'}, `Save for ${words.toLowerCase()}`));
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(e.submitter || form.querySelector('button'), async () => {
            const percent = form.level.value === '' ? NaN : Number(form.level.value);
            // Checked here in per cent: the API's bounds are a fraction's, and "less than 1" would invite 0.99 %.
            if (!(percent >= 50 && percent <= 99.9)) {
                throw {errors: [{field: 'level', message: 'enter a level in per cent, from 50 to 99.9 (e.g. 95)'}],
                    detail: `${words}: nothing was saved.`};
            }
            // Rounded: 99.9 / 100 is 0.9990000000000001, past the API's 0.999.
            await api.put('/api/planning/service-levels', {partClass, level: Number((percent / 100).toFixed(6))});
            say(`${words}: ${fmt.num(percent, 1)} % from now on.`, 'ok');
            await showLevels();
        }, form);
    });
    return form;
}

async function showLevels() {
    const l = await api.get('/api/planning/service-levels');
    mount(document.getElementById('levels'), levelForm('CRITICAL', 'Critical parts', l.critical, l.defaultCritical),
        levelForm('STANDARD', 'Standard parts', l.standard, l.defaultStandard));
}

/** The least chance down at which a pump is flagged, typed in per cent (the API takes a fraction). */
function certaintyForm(c) {
    // One sentence with the input in it, so the figure reads as what it means.
    const form = h('form', {id: 'stop-certainty-form', novalidate: true},
        h('p', {}, h('label', {for: 'least-probability'}, 'Call a pump probably down when the sensor makes it at least'),
            ' ', h('input', {id: 'least-probability', name: 'leastProbability', type: 'number', min: 50, max: 99, step: 0.1,
                class: 'percent', 'aria-describedby': 'least-probability-hint', value: Number((c.leastProbability * 100).toFixed(2))}),
            ' % likely'),
        h('p', {class: 'hint', id: 'least-probability-hint'},
            `per cent, 50 to 99; default ${fmt.num(c.defaultLeastProbability * 100, 0)} %`),
        h('button', {type: 'submit', class: 'primary'}, 'Save the figure'));
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(e.submitter || form.querySelector('button'), async () => {
            const percent = form.leastProbability.value === '' ? NaN : Number(form.leastProbability.value);
            // Checked in per cent, as the service levels are: 0.8 typed for 80 % must not be read as 0.8 %.
            if (!(percent >= 50 && percent <= 99)) {
                throw {errors: [{field: 'leastProbability', message: 'enter a chance in per cent, from 50 to 99 (e.g. 80)'}],
                    detail: 'Probably down: nothing was saved.'};
            }
            const saved = await api.put('/api/sensors/stop-certainty', {leastProbability: Number((percent / 100).toFixed(6))});
            say(`Pumps are called probably down from ${fmt.num(percent, 1)} % likely, for flags opened from now on.`, 'ok');
            showCertainty(saved);
        }, form);
    });
    return h('div', {}, form, h('p', {}, 'In force now: ',
        h('strong', {class: 'in-force'}, `at least ${fmt.num(c.leastProbability * 100, 1)} % likely`)));
}

async function showCertainty(view) {
    mount(document.getElementById('stop-certainty'), certaintyForm(view || await api.get('/api/sensors/stop-certainty')));
}

const MONTHS = [...Array(12).keys()].map(m => new Intl.DateTimeFormat(undefined, {month: 'long'}).format(new Date(2026, m, 15)));
const yearForm = document.getElementById('year-form');
mount(yearForm.startMonth, MONTHS.map((m, i) => h('option', {value: i + 1}, m)));

async function showYear(view) {
    const fy = view || await api.get('/api/spend/financial-year');
    yearForm.startMonth.value = String(fy.startMonth);
    document.getElementById('year-now').textContent = `The financial year in progress is ${fy.currentYear} (${fy.currentYearMonths}).`;
}

yearForm.addEventListener('submit', e => {
    e.preventDefault();
    busy(e.submitter || yearForm.querySelector('button'), async () => {
        await showYear(await api.put('/api/spend/financial-year', {startMonth: Number(yearForm.startMonth.value)}));
        say('Financial year saved; spend runs from now on use it.', 'ok');
    }, yearForm);
});

function laneCost(lane) {
    const id = `lane-${lane.from}-${lane.to}`;
    const form = h('form', {class: 'row', novalidate: true},
        h('label', {for: id, class: 'visually-hidden'}, `Cost per unit from ${lane.from} to ${lane.to} (${currency})`),
        h('input', {id, name: 'unitCost', type: 'number', min: 0, step: 0.01, value: lane.setCost ?? '', placeholder: fmt.num(lane.distanceCost, 2)}),
        h('button', {type: 'submit'}, h('span', {class: 'visually-hidden'}, `${lane.from} to ${lane.to}: `), 'Save'));
    form.addEventListener('submit', e => {
        e.preventDefault();
        busy(e.submitter || form.querySelector('button'), async () => {
            if (form.unitCost.value === '') {
                // The API keeps a set cost until another replaces it; the by-distance figure is the placeholder.
                throw {errors: [{field: 'unitCost', message: `give a cost per unit, 0 or more (by distance: ${fmt.num(lane.distanceCost, 2)})`}],
                    detail: `Lane ${lane.from} to ${lane.to}: nothing was saved.`};
            }
            await api.put('/api/planning/transfer-costs', {from: lane.from, to: lane.to, unitCost: Number(form.unitCost.value)});
            say(`Lane ${lane.from} to ${lane.to}: ${fmt.money(form.unitCost.value, currency)} a unit.`, 'ok');
            await showLanes();
        }, form);
    });
    return form;
}

async function showLanes() {
    const lanes = await api.get('/api/planning/transfer-costs');
    mount(document.getElementById('lanes'), table({caption: `Lanes between depots (${currency} per unit)`, id: 'lane-table', rows: lanes,
        columns: [{label: 'From', value: l => l.from}, {label: 'To', value: l => l.to},
            {label: 'Distance', num: true, value: l => `${fmt.num(l.distanceKm)} km`},
            {label: 'By distance', num: true, value: l => fmt.money(l.distanceCost, currency)},
            {label: 'In use', value: l => l.setCost === null || l.setCost === undefined ? state('by distance', 'quiet')
                : state(`set: ${fmt.money(l.setCost, currency)}`, 'info')},
            {label: 'Set a cost', value: laneCost}]}));
}

await Promise.all([showLevels(), showCertainty(), showYear(), showLanes()]);
ready();
