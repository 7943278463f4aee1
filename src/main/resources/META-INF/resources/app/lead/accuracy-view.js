/*
 * One finished accuracy check drawn for people: the summary in words, the table per level and method, the service
 * against the two benchmarks per depot, the chart of forecast against actual 12-month totals with its table, the
 * notes, the CSV download and the rows with search and sort (accuracy-rows.js).
 */
import {fmt, monthLabel} from './lead.js';
import {h, mount, table, figures} from '/app/js/ui.js';
import {scatterChart} from '/app/js/chart.js';
import {rowsTable} from './accuracy-rows.js';

export const METHOD_NAMES = {service: 'the service', mean12: 'the 12-month mean', croston: 'Croston'};
const LEVEL_WORDS = {PROGRAMME: ['Whole programme', 'parts'], DEPOT: ['Depots', 'part × depot series'],
    KIT: ['Mechanics\' kits', 'part × kit series']};
const units = v => fmt.num(v, 1);
const whole = v => fmt.num(v, 0);

function summary(results, level, method) {
    return results.summaries.find(s => s.level === level && s.method === method);
}

/** "6 % more than was used" / "about as much as was used": the total bias in words. */
export function biasWords(percent) {
    if (percent === null || percent === undefined) {
        return 'nothing was used, so there is no share to compare';
    }
    if (Math.abs(percent) < 0.5) {
        return 'about as much as was used';
    }
    return `${whole(Math.abs(percent))} % ${percent > 0 ? 'more' : 'less'} than was used`;
}

function sentences(results) {
    const from = monthLabel(results.actualFrom);
    const depot = m => summary(results, 'DEPOT', m);
    const programme = m => summary(results, 'PROGRAMME', m);
    const said = [];
    if (depot('service')) {
        said.push(`Over the 12 months from ${from} the service's forecasts were off by ${units(depot('service').mae)} units `
            + `per part and depot on average; the 12-month mean was off by ${units(depot('mean12').mae)} and Croston by `
            + `${units(depot('croston').mae)}.`);
        said.push(`Across all depots the service forecast ${biasWords(depot('service').totalBiasPercent)} `
            + `(${whole(depot('service').forecastTotal)} units forecast, ${whole(depot('service').actualTotal)} used).`);
        said.push(`The actual total fell inside the 80 % range for ${whole(depot('service').coverage80)} % of `
            + `${whole(depot('service').series)} part × depot series, and inside the 95 % range for ${whole(depot('service').coverage95)} %.`);
    }
    if (programme('service')) {
        said.push(`For the programme as a whole the service was off by ${units(programme('service').mae)} units per part `
            + `(12-month mean: ${units(programme('mean12').mae)}, Croston: ${units(programme('croston').mae)}); its 80 % range `
            + `held ${whole(programme('service').coverage80)} % and its 95 % range ${whole(programme('service').coverage95)} % of the parts' totals.`);
    }
    return said.length ? said : ['No part had a forecast to check in this run.'];
}

function levelTable(results) {
    return table({caption: 'Each forecast per level: average miss, total bias and how often the ranges held', id: 'level-summary',
        rows: results.summaries, columns: [
            {label: 'Level', value: s => `${(LEVEL_WORDS[s.level] || [s.level])[0]} (${whole(s.series)} ${(LEVEL_WORDS[s.level] || [])[1] || 'series'})`},
            {label: 'Forecast by', value: s => METHOD_NAMES[s.method] || s.method},
            {label: 'Off by on average', num: true, value: s => `${units(s.mae)} units`},
            {label: 'Forecast / used', num: true, value: s => `${whole(s.forecastTotal)} / ${whole(s.actualTotal)}`},
            {label: 'In total', value: s => biasWords(s.totalBiasPercent)},
            {label: 'Inside 80 % range', num: true, value: s => `${whole(s.coverage80)} %`},
            {label: 'Inside 95 % range', num: true, value: s => `${whole(s.coverage95)} %`}]});
}

/** Per depot, from its rows: the average miss of each forecast and how often the service's 80 % range held. */
function depotTable(results) {
    const byDepot = new Map();
    for (const row of results.rows.filter(r => r.level === 'DEPOT')) {
        const d = byDepot.get(row.location) || {location: row.location, n: 0, used: 0, service: 0, mean12: 0, croston: 0, in80: 0};
        d.n++;
        d.used += row.actual;
        ['service', 'mean12', 'croston'].forEach(m => d[m] += Math.abs(row[m].error));
        d.in80 += row.service.inside80 ? 1 : 0;
        byDepot.set(row.location, d);
    }
    const rows = [...byDepot.values()].sort((a, b) => a.location.localeCompare(b.location));
    return table({caption: 'Per depot: average miss per part, units over the 12 months', id: 'depot-summary', rows,
        columns: [{label: 'Depot', value: d => d.location},
            {label: 'Parts', num: true, value: d => whole(d.n)},
            {label: 'Used', num: true, value: d => whole(d.used)},
            {label: 'The service', num: true, value: d => units(d.service / d.n)},
            {label: '12-month mean', num: true, value: d => units(d.mean12 / d.n)},
            {label: 'Croston', num: true, value: d => units(d.croston / d.n)},
            {label: 'Inside the service\'s 80 % range', num: true, value: d => `${whole(100 * d.in80 / d.n)} %`}]});
}

function chart(results) {
    const points = results.rows.filter(r => r.level === 'DEPOT')
        .map(r => ({label: `${r.partNumber} at ${r.location}`, x: r.service.forecast, y: r.actual}));
    return scatterChart({title: 'The service\'s forecast against what was used, 12-month totals per part and depot',
        xLabel: 'Forecast (units in 12 months)', yLabel: 'Used (units in 12 months)', pointName: 'Part at depot',
        points, diagonal: true, format: whole});
}

function failed(report) {
    return h('p', {class: 'message message--error', role: 'alert'}, `This check stopped without results: `
        + `${report.job.message || 'no reason was given'}. Start it again; nothing was changed by it.`);
}

export function showReport(box, report, csvHref) {
    const results = report.results;
    if (!results) {
        mount(box, report.job.state === 'FAILED' ? failed(report) : h('p', {}, `The check is ${report.job.stateWords}.`));
        return;
    }
    mount(box,
        h('p', {class: 'provenance'}, `Forecast as of ${fmt.date(results.origin)} (forecast run ${results.forecastRunId}, `
            + `made for this check and never used for planning), compared with ${fmt.date(results.actualFrom)} to ${fmt.date(results.actualTo)}.`),
        h('div', {id: 'programme-summary', class: 'before-after-words'}, sentences(results).map(s => h('p', {}, s))),
        figures([['Series checked', whole(results.rows.length)], ['Months compared', '12'],
            ['Check started by', report.job.startedBy || '–'], ['Finished', fmt.dateTime(report.job.finishedAt)]]),
        results.notes.length ? h('ul', {class: 'hint', id: 'report-notes'}, results.notes.map(n => h('li', {}, n))) : null,
        h('p', {class: 'row no-print'}, h('a', {class: 'button', id: 'rows-csv', href: csvHref, download: `accuracy-check-${report.id}.csv`},
            'Download every row as CSV')),
        levelTable(results), depotTable(results), chart(results), rowsTable(results.rows));
}
