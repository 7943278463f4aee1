/*
 * Stock, counts and files: balances of this store with a search, the stock count sheet (book quantity shown,
 * counted entered; only counted lines are sent, as one count import), CSV imports with every row-and-column
 * problem shown on the page, and CSV exports.
 */
import * as api from '/app/js/api.js';
import * as fmt from '/app/js/format.js';
import {h, mount, table, say, busy, showError, caution} from '/app/js/ui.js';
import {startOfficer, describe, ready, parseCsv, csvCell} from './officer.js';

const {store, parts} = await startOfficer({page: 'stock', title: 'Stock, counts and files'});
const main = document.getElementById('content');
const unit = p => (parts.get(p) || {}).unitOfIssue;

const IMPORTS = [
    {path: '/api/stock/counts/import', label: 'Stock count (location_code, part_number, quantity, counted_on)'},
    {path: '/api/purchase-orders/import', label: 'Purchase orders'},
    {path: '/api/pumps/import', label: 'Pumps'},
    {path: '/api/pumps/usage/import', label: 'Pump usage readings'},
    {path: '/api/repairs/import', label: 'Repair history'},
    {path: '/api/parts/import', label: 'Parts catalogue (central store officers)'}
];
const EXPORTS = [
    {path: () => `/api/stock/counts/export?location=${encodeURIComponent(store.code)}`, file: () => `count-sheet-${store.code}.csv`, label: 'Count sheet of this store'},
    {path: () => '/api/purchase-orders/export', file: () => 'purchase-orders.csv', label: 'Purchase orders'},
    {path: () => '/api/parts/export', file: () => 'parts.csv', label: 'Parts catalogue'},
    {path: () => '/api/pumps/export', file: () => 'pumps.csv', label: 'Pumps'},
    {path: () => '/api/repairs/export', file: () => 'repairs.csv', label: 'Repair history'}
];

async function load() {
    if (!store) {
        ready();
        return;
    }
    const [balances, sheet] = await Promise.all([api.get('/api/stock/balances', {location: store.code}),
        api.get('/api/stock/counts/export', {location: store.code})]);
    const rows = parseCsv(sheet);
    // Counting stock means handling rods and rising mains (heavy lengths) and parts that touch drinking water.
    mount(main, balancesSection(withStockedAtNothing(balances, rows)), countSection(rows), importSection(), exportSection(), caution());
    ready();
}

/**
 * The ledger lists a part only once it has moved here; a part stocked here and run out since is on the count sheet at
 * 0 but not among the balances, and a search for it said "no part matches". Such parts join the list at 0.
 */
function withStockedAtNothing(balances, sheetRows) {
    const [header, ...lines] = sheetRows.filter(r => r.length > 1);
    const part = header ? header.indexOf('part_number') : -1;
    const listed = new Set(balances.map(b => b.partNumber));
    const missing = part < 0 ? [] : lines.map(r => r[part]).filter(p => p && !listed.has(p))
        .map(p => ({partNumber: p, description: (parts.get(p) || {}).description || '', onHand: 0, onOrder: 0}));
    return [...balances, ...missing].sort((a, b) => a.partNumber.localeCompare(b.partNumber));
}

function balancesSection(balances) {
    const search = h('input', {type: 'search', id: 'balance-search', name: 'search', placeholder: 'Part number or words'});
    const holder = h('div', {});
    const show = () => {
        const words = search.value.trim().toLowerCase().split(/\s+/).filter(Boolean);
        const rows = balances.filter(b => words.every(w => `${b.partNumber} ${b.description}`.toLowerCase().includes(w)));
        mount(holder, table({caption: `${fmt.num(rows.length)} of ${fmt.num(balances.length)} parts at ${store.code}`, id: 'balances', rows,
            empty: 'No part matches the search.', columns: [
                {label: 'Part', value: b => describe(parts, b.partNumber)},
                {label: 'On hand', value: b => fmt.qty(b.onHand, unit(b.partNumber)), num: true},
                {label: 'On order', value: b => fmt.qty(b.onOrder, unit(b.partNumber)), num: true}]}));
    };
    search.addEventListener('input', show);
    show();
    return h('section', {'aria-labelledby': 'bal-title'}, h('h2', {id: 'bal-title'}, 'Balances'),
        h('div', {class: 'search-box'}, h('div', {}, h('label', {for: 'balance-search'}, 'Search'), search)), holder);
}

function countSection(rows) {
    const [header, ...lines] = rows.filter(r => r.length > 1);
    const col = name => header.indexOf(name);
    const entries = lines.map((r, i) => ({partNumber: r[col('part_number')], book: r[col('quantity')],
        input: h('input', {type: 'number', id: `count-${i}`, name: `count-${r[col('part_number')]}`, min: 0, step: 'any', class: 'count-input'})}));
    const day = h('input', {type: 'date', id: 'counted-on', name: 'counted_on', value: fmt.isoDay(), max: fmt.isoDay(), required: true});
    const go = h('button', {type: 'submit', class: 'primary'}, 'Book the count');
    const form = h('form', {id: 'count-sheet'},
        h('p', {class: 'hint'}, 'Enter what you counted; leave a line empty if you did not count it. The difference from '
            + 'the book quantity is posted as a count adjustment.'),
        h('div', {class: 'inline-field'}, h('label', {for: 'counted-on'}, 'Counted on'), day),
        table({caption: `Count sheet for ${store.code}`, rows: entries, columns: [
            {label: 'Part', value: e => describe(parts, e.partNumber)},
            {label: 'Book quantity', value: e => fmt.qty(e.book, unit(e.partNumber)), num: true},
            {label: 'Counted', value: e => [h('label', {for: e.input.id, class: 'visually-hidden'}, `Counted ${e.partNumber}`), e.input]}]}),
        go);
    form.addEventListener('submit', ev => {
        ev.preventDefault();
        const counted = entries.filter(e => e.input.value !== '');
        if (!counted.length) {
            say('Enter at least one counted quantity.', 'error');
            return;
        }
        const csv = ['location_code,part_number,quantity,counted_on',
            ...counted.map(e => [store.code, e.partNumber, e.input.value, day.value].map(csvCell).join(','))].join('\n');
        busy(go, async () => {
            try {
                const result = await api.upload('/api/stock/counts/import', csv);
                await load();
                say(`Count booked: ${fmt.num(result.rowsImported)} lines; balances now match what was counted.`);
            } catch (e) {
                showError(e, form);
                showFileErrors(form, e, counted.map(x => x.partNumber));
            }
        }, form);
    });
    return h('section', {'aria-labelledby': 'count-title'}, h('h2', {id: 'count-title'}, 'Stock count'), form);
}

/** A refused file: every problem by row and column, in a table beside the upload (rows counted as in the file). */
function showFileErrors(form, error, partsByLine) {
    form.querySelectorAll('.file-errors').forEach(e => e.remove());
    if (!error.errors || !error.errors.length) {
        return;
    }
    form.append(h('div', {class: 'file-errors'}, table({caption: `The file was refused: ${error.errors.length} problems, nothing was written`,
        rows: error.errors, columns: [
            {label: 'Where', value: e => e.field},
            partsByLine ? {label: 'Part', value: e => {
                const row = /^row (\d+)/.exec(e.field);
                return row ? partsByLine[Number(row[1]) - 2] || '–' : '–';
            }} : null,
            {label: 'Problem', value: e => e.message}].filter(Boolean)})));
}

function importSection() {
    const kind = h('select', {id: 'import-kind', name: 'kind'}, IMPORTS.map(i => h('option', {value: i.path}, i.label)));
    const file = h('input', {type: 'file', id: 'import-file', name: 'file', accept: '.csv,text/csv', required: true});
    const go = h('button', {type: 'submit', class: 'primary'}, 'Import');
    const form = h('form', {id: 'import-form', class: 'task'},
        h('div', {class: 'line-grid'}, h('div', {}, h('label', {for: 'import-kind'}, 'What the file holds'), kind),
            h('div', {}, h('label', {for: 'import-file'}, 'CSV file', h('span', {class: 'hint'}, 'comma or semicolon separated; the whole file is refused if any row is wrong')), file)),
        go);
    form.addEventListener('submit', ev => {
        ev.preventDefault();
        busy(go, async () => {
            form.querySelectorAll('.file-errors').forEach(e => e.remove());
            const text = await file.files[0].text();
            try {
                const result = await api.upload(kind.value, text);
                await load();
                say(`Imported ${fmt.num(result.rowsImported)} rows from ${file.files[0].name}.`);
            } catch (e) {
                showError(e, form);
                showFileErrors(form, e, null);
            }
        }, form);
    });
    return h('section', {'aria-labelledby': 'import-title'}, h('h2', {id: 'import-title'}, 'Import a CSV file'), form);
}

function exportSection() {
    return h('section', {'aria-labelledby': 'export-title'}, h('h2', {id: 'export-title'}, 'Download as CSV'),
        h('div', {class: 'row'}, EXPORTS.map(x => h('a', {class: 'button', href: x.path(), download: x.file()}, x.label))));
}

await load();
