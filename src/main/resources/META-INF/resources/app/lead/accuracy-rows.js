/*
 * The rows of an accuracy check: one line per part and place with what was used, each forecast of the 12-month
 * total and whether the service's ranges held. A search box and a level choice narrow them; a column heading's
 * button sorts by it (again to reverse), and so does the "Sort by" choice (a phone shows no headings). At most LIMIT lines are drawn at once; the CSV has them all.
 */
import {fmt} from './lead.js';
import {h, mount, state} from '/app/js/ui.js';

const LIMIT = 200;
const LEVELS = [['', 'Every level'], ['PROGRAMME', 'Whole programme'], ['DEPOT', 'Depots'], ['KIT', 'Mechanics\' kits']];
const PLACE = {PROGRAMME: 'whole programme', KIT: 'kit'};
const whole = v => fmt.num(v, 0);

function rangeWords(score) {
    return score.inside80 ? state('inside the 80 % range', 'ok')
        : score.inside95 ? state('inside the 95 % range only', 'warn') : state('outside both ranges', 'urgent');
}

const COLUMNS = [
    {key: 'part', label: 'Part', sort: r => r.partNumber, value: r => r.partNumber},
    {key: 'place', label: 'Where', sort: r => r.location, value: r => PLACE[r.level] ? `${r.location} (${PLACE[r.level]})` : r.location},
    {key: 'used', label: 'Used', num: true, sort: r => r.actual, value: r => whole(r.actual)},
    {key: 'service', label: 'The service', num: true, sort: r => r.service.forecast, value: r => whole(r.service.forecast)},
    {key: 'range', label: 'Its 80 % range', num: true, sort: r => r.service.high80 - r.service.low80,
        value: r => `${whole(r.service.low80)}–${whole(r.service.high80)}`},
    {key: 'held', label: 'Used was', sort: r => (r.service.inside80 ? 0 : r.service.inside95 ? 1 : 2), value: r => rangeWords(r.service)},
    {key: 'miss', label: 'Service off by', num: true, sort: r => Math.abs(r.service.error), value: r => whole(Math.abs(r.service.error))},
    {key: 'mean12', label: '12-month mean', num: true, sort: r => r.mean12.forecast, value: r => whole(r.mean12.forecast)},
    {key: 'croston', label: 'Croston', num: true, sort: r => r.croston.forecast, value: r => whole(r.croston.forecast)}
];

/** The rows the view asks for: its level and search text, sorted by its column. */
function chosenRows(rows, view) {
    const text = view.text.trim().toLowerCase();
    const chosen = rows.filter(r => (!view.level || r.level === view.level)
        && (!text || r.partNumber.toLowerCase().includes(text) || r.location.toLowerCase().includes(text)));
    const column = COLUMNS.find(c => c.key === view.key);
    return chosen.sort((a, b) => {
        const x = column.sort(a), y = column.sort(b);
        const order = typeof x === 'string' ? x.localeCompare(y) : x - y;
        return view.descending ? -order : order;
    });
}

function headings(view, sortBy) {
    return COLUMNS.map(c => h('th', {scope: 'col', class: c.num ? 'num' : null,
        'aria-sort': c.key === view.key ? (view.descending ? 'descending' : 'ascending') : null},
        h('button', {type: 'button', class: 'sort', onclick: () => sortBy(c.key)}, c.label,
            c.key === view.key ? h('span', {'aria-hidden': 'true'}, view.descending ? ' ▼' : ' ▲') : null)));
}

function field(id, words, input) {
    return h('div', {class: 'inline-field'}, h('label', {for: id}, words), input);
}

export function rowsTable(rows) {
    const view = {text: '', level: 'DEPOT', key: 'miss', descending: true};
    const search = h('input', {id: 'row-search', type: 'search', name: 'search', placeholder: 'Part number or place'});
    const level = h('select', {id: 'row-level', name: 'level'}, LEVELS.map(([v, words]) => h('option', {value: v}, words)));
    level.value = view.level;
    const order = h('select', {id: 'row-sort', name: 'sort'}, COLUMNS.map(c => [
        h('option', {value: `${c.key}:up`}, `${c.label}, lowest first`), h('option', {value: `${c.key}:down`}, `${c.label}, highest first`)]));
    const head = h('tr');
    const body = h('tbody');
    const count = h('p', {class: 'hint', id: 'row-count', 'aria-live': 'polite'});

    function draw() {
        const chosen = chosenRows(rows, view);
        mount(head, headings(view, sortBy));
        mount(body, chosen.slice(0, LIMIT).map(r => h('tr', {}, COLUMNS.map(c =>
            h('td', {class: c.num ? 'num' : null, 'data-label': c.label}, c.value(r))))));
        order.value = `${view.key}:${view.descending ? 'down' : 'up'}`;
        count.textContent = chosen.length > LIMIT ? `Showing ${whole(LIMIT)} of ${whole(chosen.length)} rows: narrow the search, or download the CSV.`
            : `${whole(chosen.length)} of ${whole(rows.length)} rows.`;
    }

    function sortBy(key) {
        view.descending = view.key === key ? !view.descending : false;
        view.key = key;
        draw();
        head.querySelector('th[aria-sort] button').focus();
    }

    search.addEventListener('input', () => draw(view.text = search.value));
    level.addEventListener('change', () => draw(view.level = level.value));
    order.addEventListener('change', () => {
        [view.key] = order.value.split(':');
        view.descending = order.value.endsWith(':down');
        draw();
    });
    draw();
    return h('section', {'aria-labelledby': 'rows-heading'}, h('h3', {id: 'rows-heading'}, 'Every part and place'),
        h('form', {class: 'lead-form filters', role: 'search', onsubmit: e => e.preventDefault()},
            field('row-search', 'Find a part or place', search), field('row-level', 'Series', level), field('row-sort', 'Sort by', order)),
        count,
        h('div', {class: 'table-wrap'}, h('table', {class: 'stack', id: 'row-table'},
            h('caption', {}, 'Forecast and use per part and place, 12-month totals in units'), h('thead', {}, head), body)));
}
