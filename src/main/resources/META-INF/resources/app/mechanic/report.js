/*
 * report.js: the mechanic reports a pump broken or working again since a day. Opened from a pump probably down in the
 * sensors' list, the day is the one the sensor saw its use fall, said so beside it and open to change; from anywhere
 * else it is today. The day is never after today nor before the pump was installed (the server refuses both too; a
 * refusal that still comes, say from data older than the pump's record, shows under "Waiting to send" in its words).
 *   const {form, open} = statusForm(snapshot, queue);  open(assetId, status, sensorPump)
 */
import * as fmt from '/app/js/format.js';
import {h, mount, clearErrors} from '/app/js/ui.js';
import {field, refuse} from './forms.js';

function pumpSelect(snapshot) {
    return h('select', {name: 'assetId', required: true}, h('option', {value: ''}, 'Choose a pump'),
        snapshot.pumps.map(p => h('option', {value: p.assetId}, `${p.assetId} (${p.status === 'BROKEN' ? 'broken' : 'working'})`)));
}

/** The sensor's day, kept inside the pump's life: not after today, not before its installation. */
function sensorDay(pump, sensor, today) {
    const day = sensor.stoppedFrom > today ? today : sensor.stoppedFrom;
    return pump && pump.installedOn && day < pump.installedOn ? pump.installedOn : day;
}

export function statusForm(snapshot, queue) {
    const since = h('input', {type: 'date', name: 'since', max: fmt.isoDay(), value: fmt.isoDay(), 'aria-describedby': 'since-source'});
    const source = h('p', {class: 'hint', id: 'since-source'});
    const form = h('form', {id: 'status-form', novalidate: true},
        field('Pump', pumpSelect(snapshot)),
        field('The pump is', h('select', {name: 'status'}, h('option', {value: 'BROKEN'}, 'Broken: no water'),
            h('option', {value: 'WORKING'}, 'Working again'))),
        field('Since', since), source,
        field('Note', h('textarea', {name: 'note', maxlength: '300', rows: '2'}), 'optional'),
        h('p', {}, h('button', {type: 'submit', class: 'primary'}, 'Send this report')));
    const pumpOf = assetId => snapshot.pumps.find(p => p.assetId === assetId);
    /** Today unless the sensor's day is given; the earliest day allowed is the pump's installation. */
    let fromSensor = null;
    const setDay = (assetId, sensor) => {
        fromSensor = sensor && sensor.stoppedFrom ? sensor : null;
        const today = fmt.isoDay();
        const pump = pumpOf(assetId);
        since.max = today;
        since.min = pump && pump.installedOn ? pump.installedOn : '';
        since.value = fromSensor ? sensorDay(pump, fromSensor, today) : today;
        mount(source, fromSensor ? `From the sensor: use fell on ${fmt.date(fromSensor.stoppedFrom)}. `
            + 'Change it if you know it broke down on another day.' : []);
    };
    // The sensor's day belongs to that pump breaking down: another pump, or "working again", starts from today.
    form.elements.assetId.addEventListener('change', () => setDay(form.elements.assetId.value, null));
    form.elements.status.addEventListener('change', () => {
        if (fromSensor && form.elements.status.value !== 'BROKEN') {
            setDay(form.elements.assetId.value, null);
        }
    });
    // Marking or clearing an error replaces the field's description: the words on the date's source stay with it.
    const describeSince = () => since.setAttribute('aria-describedby',
        [...new Set([...(since.getAttribute('aria-describedby') || '').split(' ').filter(Boolean), 'since-source'])].join(' '));
    form.addEventListener('submit', async e => {
        e.preventDefault();
        clearErrors(form);
        describeSince();
        const assetId = form.elements.assetId.value;
        const day = since.value;
        const pump = pumpOf(assetId);
        const errors = [];
        if (!assetId) {
            errors.push({field: 'assetId', message: 'choose the pump'});
        }
        if (!day || day > fmt.isoDay()) {
            errors.push({field: 'since', message: 'give a day up to today'});
        } else if (pump && pump.installedOn && day < pump.installedOn) {
            errors.push({field: 'since', message: `cannot be before the pump was installed on ${fmt.date(pump.installedOn)}`});
        }
        if (errors.length) {
            refuse(form, errors);
            describeSince();
            return false;
        }
        const status = form.elements.status.value;
        // A report needs no reference: the same report again changes nothing (the API keeps the earlier date).
        await queue({kind: 'status', method: 'POST', path: `/api/pumps/${encodeURIComponent(assetId)}/status`, assetId,
            body: {status, since: day, note: form.elements.note.value.trim() || null},
            summary: `Pump ${assetId} reported ${status === 'BROKEN' ? 'broken' : 'working again'} since ${fmt.date(day)}`});
        form.reset();
        setDay('', null);
        return true;
    });
    return {form, open(assetId, status, sensor) {
        form.elements.assetId.value = assetId || '';
        if (status) {
            form.elements.status.value = status;
        }
        setDay(assetId, status === 'BROKEN' ? sensor : null);
    }};
}
