/*
 * A component family's fleet model on the lead's forecast page, drawn from /api/forecast/explorer/fleet-models/{family}:
 * the fit in figures, breakdowns per pump-year against depth and against daily use, and the coefficients.
 *   fleetView(view)   the nodes to mount
 */
import {fmt} from './lead.js';
import {h, table, figures} from '/app/js/ui.js';
import {lineChart} from '/app/js/chart.js';

export function fleetView(view) {
    const fit = view.fit;
    const ref = view.reference;
    const refWords = `a pump ${fmt.num(ref.ageYears, 1)} years old`;
    const perYear = v => fmt.num(v, 2);
    return [
        figures([
            ['Model', fit.source === 'fit' ? 'fitted on the fleet' : 'declared prior (too few breakdowns)'],
            ['Breakdowns in the fit', fmt.num(fit.events)],
            ['Operating hours in the fit', fmt.num(fit.exposureHours)],
            ['Units replaced per breakdown', fmt.num(fit.unitsPerEvent, 2)],
            ['Breakdowns per 1,000 hours (new pump, 30 m)', fmt.num(fit.eventsPer1000Hours, 3)],
            ['Spread', fit.dispersion === null ? '–' : `${fit.overdispersed ? 'overdispersed' : 'as Poisson'} (χ²/df ${fmt.num(fit.dispersion, 2)})`]
        ]),
        h('p', {class: 'hint'}, view.note),
        lineChart({title: `Breakdowns per pump-year against depth (${refWords}, used ${fmt.num(ref.hoursPerDay, 1)} hours a day)`,
                x: view.byDepth.map(p => `${fmt.num(p.value)} m`), xLabel: 'Borehole depth (metres)', yLabel: 'Breakdowns per pump-year',
                format: perYear, series: [{name: 'Breakdowns per pump-year', values: view.byDepth.map(p => p.breakdownsPerPumpYear)},
                    {name: 'Units used per pump-year', dashed: true, values: view.byDepth.map(p => p.unitsPerPumpYear)}]}),
            lineChart({title: `Breakdowns per pump-year against daily use (${refWords}, ${fmt.num(ref.depthM)} m deep)`,
                x: view.byDailyUse.map(p => `${fmt.num(p.value)} h`), xLabel: 'Daily use (hours a day)', yLabel: 'Breakdowns per pump-year',
                format: perYear, series: [{name: 'Breakdowns per pump-year', values: view.byDailyUse.map(p => p.breakdownsPerPumpYear)},
                    {name: 'Units used per pump-year', dashed: true, values: view.byDailyUse.map(p => p.unitsPerPumpYear)}]}),
        table({caption: `Coefficients of the ${fmt.family(fit.family)} model, with 95 % intervals`, rows: view.terms,
            columns: [{label: 'Term', value: t => t.name.replace(/_/g, ' ')},
                {label: 'Meaning', value: t => t.words},
                {label: 'Estimate', num: true, value: t => fmt.num(t.estimate, 3)},
                {label: '95 % interval', num: true, value: t => t.low95 === null || t.low95 === undefined ? 'none (prior)' : `${fmt.num(t.low95, 3)} to ${fmt.num(t.high95, 3)}`},
                {label: 'Rate ratio', num: true, value: t => t.name === 'intercept' ? '–' : fmt.num(t.rateRatio, 3)},
                {label: 'Rate ratio, 95 %', num: true, value: t => t.name === 'intercept' || t.rateRatioLow95 === null || t.rateRatioLow95 === undefined
                    ? '–' : `${fmt.num(t.rateRatioLow95, 3)} to ${fmt.num(t.rateRatioHigh95, 3)}`}]})];
}

