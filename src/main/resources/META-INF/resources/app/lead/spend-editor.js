/*
 * The spend page's scenario editor: a scenario's figures, its new installations row by row, the service level asked in
 * per cent (checked here, sent as the API's fraction), saved as it was opened or as a new scenario. A refusal is said
 * beside each field, the top line in words.
 *   openEditor({models, depots, afterSave})   wires the form once; afterSave() runs after each save (the list redraws)
 *   edit(scenario)                        opens it filled in; edit(null) a new scenario
 */
import {api} from './lead.js';
import {h, mount, busy, say, clearErrors} from '/app/js/ui.js';

const form = document.getElementById('scenario-form');
const editorCard = document.getElementById('editor-card');
const installBox = document.getElementById('installations');
let models = [];
let depots = [];
let afterSave = async () => {};
let editing = null;

export function openEditor(given) {
    ({models, depots, afterSave} = given);
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

export function edit(s) {
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
    await afterSave();
}
