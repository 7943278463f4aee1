/*
 * One part's forecast on the lead's forecast page, drawn from /api/forecast/explorer/parts/{part}: the key figures,
 * the monthly history and 24-month forecast with its 80 % and 95 % ranges, and how the method was chosen.
 *   partView(view, where, yearsShown)   the nodes to mount (where: a location code, '' for the whole programme)
 */
import {methodWords, monthLabel, fmt} from './lead.js';
import {h, table, figures, state} from '/app/js/ui.js';
import {lineChart} from '/app/js/chart.js';

function num1(v) {
    return fmt.num(v, 1);
}

function scoreCell(v) {
    return v === null || v === undefined ? 'not scored' : fmt.num(v, 3);
}

function chart(view, yearsShown) {
    const f = view.forecast;
    const history = yearsShown > 0 ? f.history.slice(-12 * yearsShown) : f.history;
    const x = [...history.map(m => monthLabel(m.month)), ...f.forecast.map(m => monthLabel(m.month))];
    const pad = n => Array(n).fill(null);
    const nh = history.length;
    // The part's own unit word: a part counted in sets said "pieces" on the axis beside "sets" in the figures.
    const unit = unitWord(view.unitOfIssue) || (view.unitOfIssue || 'units').toLowerCase();
    return lineChart({
        title: `${view.partNumber} at ${view.location === 'PROGRAMME' ? 'the whole programme' : view.location}: used each month and forecast`,
        x, xLabel: 'Month', yLabel: `Units a month (${unit})`, format: num1,
        // The history is what breakdown repairs used; the forecast adds the scheduled services. Its breakdown part is
        // drawn too, so the step at the forecast's start is not read as demand jumping.
        series: [{name: 'Used in breakdown repairs', values: [...history.map(m => m.quantity), ...pad(f.forecast.length)]},
            {name: 'Forecast, breakdowns and services', dashed: true, values: [...pad(nh), ...view.ranges.map(r => r.mean)]},
            {name: 'Forecast, breakdowns only', dotted: true, values: [...pad(nh), ...f.forecast.map(m => m.breakdown)]}],
        bands: [{name: '95 % range', level: 95, lower: [...pad(nh), ...view.ranges.map(r => r.low95)], upper: [...pad(nh), ...view.ranges.map(r => r.high95)]},
            {name: '80 % range', level: 80, lower: [...pad(nh), ...view.ranges.map(r => r.low80)], upper: [...pad(nh), ...view.ranges.map(r => r.high80)]}],
        marker: {at: nh, label: 'forecast starts'}
    });
}

function howChosen(view) {
    const f = view.forecast;
    const hold = view.holdout;
    const holdText = hold.fleetRmsse === null || hold.fleetRmsse === undefined
        ? 'No fleet model covers this part here, so its own history is used.'
        : `For comparison only: over the last 12 months held out, the fleet model scored RMSSE ${fmt.num(hold.fleetRmsse, 3)} and `
          + `the part's own history RMSSE ${fmt.num(hold.historyRmsse, 3)} (lower is better). `
          + (hold.chosen === 'fleet model'
              // Said before the choice, so a lower history score beside "uses the fleet model" does not read as a slip.
              ? 'A part the fleet model covers takes the fleet rate, updated by its own history, whichever scored lower on '
                + 'one held-out year. The forecast uses the fleet model' + (f.methodDetail && f.methodDetail !== 'fleet model' ? `: ${f.methodDetail}.` : '.')
              : `The forecast uses the part's own history (${methodWords(f.method)}).`);
    return h('div', {class: 'method-box'},
        h('h3', {}, 'How the method was chosen'),
        h('p', {}, 'Used: ', h('strong', {}, methodWords(f.method)),
            f.alpha !== null && f.alpha !== undefined ? ` (α ${fmt.num(f.alpha, 2)}${f.beta !== null && f.beta !== undefined ? `, β ${fmt.num(f.beta, 2)}` : ''})` : '', '.'),
        h('p', {}, holdText),
        table({caption: 'History methods scored on this part\'s history', rows: view.historyMethods,
            empty: 'Too little history to score the methods against each other (fewer than 18 months or fewer than two demands).',
            columns: [{label: 'Method', value: m => methodWords(m.method)},
                {label: 'MASE', num: true, value: m => scoreCell(m.mase)},
                {label: 'RMSSE', num: true, value: m => scoreCell(m.rmsse)},
                {label: 'Bias (scaled)', num: true, value: m => scoreCell(m.scaledBias)},
                {label: 'In use', value: m => m.chosen ? state('used', 'ok') : state('not used', 'quiet')}]}),
        h('p', {class: 'hint'}, view.backtestBasis, ' ', view.holdout.basis),
        h('details', {}, h('summary', {}, 'How the ranges are worked out'), h('p', {}, view.intervalModel)));
}

function unitWord(unit) {
    return fmt.qty(2, unit).replace(/^[\d.,\s]+/, '');
}

export function partView(view, where, yearsShown) {
    const f = view.forecast;
    const next12 = view.ranges.slice(0, 12).reduce((s, r) => s + r.mean, 0);
    const whole = fmt.wholeUnits(view.unitOfIssue);
    return [
        h('h3', {}, `${view.partNumber} · ${view.description}`, h('span', {class: 'muted'}, ` at ${where ? where : 'the whole programme'}`)),
        figures([
            ['Method used', methodWords(f.method)],
            ['Expected next month', `${fmt.num(view.ranges[0].mean, whole ? 1 : 2)} ${unitWord(view.unitOfIssue)}`],
            ['Expected next 12 months', fmt.qty(next12, view.unitOfIssue)],
            ['Next month, 80 % range', `${fmt.qty(view.ranges[0].low80, view.unitOfIssue)} to ${fmt.qty(view.ranges[0].high80, view.unitOfIssue)}`],
            ['Demand pattern', f.demandClass ? f.demandClass.replace(/_/g, ' ').toLowerCase() : '–'],
            ['Months between demands (ADI)', fmt.num(f.adi, 2)]
        ]),
        chart(view, yearsShown),
        f.forecast.length && f.forecast[0].preventive > 0 ? h('p', {class: 'hint', id: 'history-note'}, 'The solid line counts '
            + `the parts breakdown repairs used; the forecast adds the scheduled services: next month ${fmt.num(f.forecast[0].preventive, 1)} `
            + `of the ${fmt.num(f.forecast[0].total, 1)} expected are for services.`) : null,
        howChosen(view)];
}

