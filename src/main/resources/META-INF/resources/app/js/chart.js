/*
 * chart.js: SVG charts drawn by our own code, each with labelled axes (with units), a legend in words and the
 * same numbers as a table beside it (below it on a phone and in print). No canvas: SVG prints crisply.
 *   lineChart({title, x, xLabel, yLabel, series, bands, marker, format})
 *       x: category labels (months, years); series: [{name, values, dashed?, dotted?}]; values may hold null for gaps;
 *       bands: [{name, lower, upper, level: 95|80}] drawn under the lines (95 % lighter, 80 % darker);
 *       marker: {at: index, label} a dashed vertical line (e.g. "forecast starts")
 *   fanChart(opts)   lineChart with a central series and its nested 80 % / 95 % ranges (yearly spend)
 *   barChart({title, x, xLabel, yLabel, series, format})  grouped bars; a second series is hatched, not only
 *       coloured, so it reads in black and white
 *   scatterChart({title, xLabel, yLabel, points: [{label, x, y}], diagonal, pointName})  one dot per point on
 *       numeric axes; diagonal draws the line y = x (where forecast equals actual); the table lists the points
 * format(value) turns a number into text for ticks and the table (default: thousands separators, 1 decimal);
 * cell(value), where given, for the table only (money in the table with its currency, the axis says it once).
 * Each returns a <figure> to put in the page.
 */
import {h, table} from './ui.js';
import {num} from './format.js';

const SVG = 'http://www.w3.org/2000/svg';
const W = 640, H = 320, M = {left: 70, right: 16, top: 14, bottom: 52};
const INK = ['#1d5f7a', '#8a2b12', '#3d6b2a', '#5b4a8a'];
let counter = 0;
// A line's style says which it is without its colour: solid, dashed or dotted.
const DASHES = {dashed: '6 4', dotted: '2 3'};
const STYLE_WORDS = {line: 'solid line', dashed: 'dashed line', dotted: 'dotted line'};
const styleOf = r => (r.dotted ? 'dotted' : r.dashed ? 'dashed' : 'line');

function s(tag, attrs = {}, ...children) {
    const el = document.createElementNS(SVG, tag);
    for (const [k, v] of Object.entries(attrs)) {
        if (v !== undefined && v !== null) {
            el.setAttribute(k, v);
        }
    }
    children.flat(Infinity).forEach(c => c !== null && c !== undefined && el.append(c instanceof Node ? c : document.createTextNode(String(c))));
    return el;
}

export function niceTicks(min, max, count = 5) {
    if (!(max > min)) {
        max = min + 1;
    }
    const raw = (max - min) / count;
    const mag = 10 ** Math.floor(Math.log10(raw));
    const step = [1, 2, 2.5, 5, 10].map(f => f * mag).find(st => st >= raw);
    const ticks = [];
    for (let v = Math.floor(min / step) * step; v <= max + step * 1e-9; v += step) {
        ticks.push(Math.round(v / step) * step);
    }
    if (ticks[ticks.length - 1] < max) {
        ticks.push(ticks[ticks.length - 1] + step);
    }
    return ticks;
}

function frame(x, values, yLabel, xLabel, format) {
    const finite = values.filter(v => v !== null && v !== undefined && Number.isFinite(v));
    const ticks = niceTicks(Math.min(0, ...finite), Math.max(0, ...finite));
    const lo = ticks[0], hi = ticks[ticks.length - 1];
    const innerW = W - M.left - M.right, innerH = H - M.top - M.bottom;
    const y = v => M.top + innerH - ((v - lo) / (hi - lo)) * innerH;
    const every = Math.max(1, Math.ceil(x.length / 8));
    const g = s('g', {class: 'chart-axis'},
        s('g', {class: 'chart-grid'}, ticks.map(t => s('line', {x1: M.left, x2: W - M.right, y1: y(t), y2: y(t)}))),
        ticks.map(t => s('text', {x: M.left - 6, y: y(t) + 4, 'text-anchor': 'end'}, format(t))),
        s('line', {x1: M.left, x2: M.left, y1: M.top, y2: M.top + innerH}),
        s('line', {x1: M.left, x2: W - M.right, y1: M.top + innerH, y2: M.top + innerH}),
        s('text', {x: 14, y: M.top + innerH / 2, transform: `rotate(-90 14 ${M.top + innerH / 2})`, 'text-anchor': 'middle'}, yLabel),
        s('text', {x: M.left + innerW / 2, y: H - 6, 'text-anchor': 'middle'}, xLabel));
    return {g, y, innerW, innerH, every};
}

function svgFor(title, children) {
    const id = `chart-${++counter}`;
    return s('svg', {viewBox: `0 0 ${W} ${H}`, role: 'img', 'aria-labelledby': `${id}-t`},
        s('title', {id: `${id}-t`}, title), children);
}

function swatch(kind, i, hatchId) {
    const color = INK[i % INK.length];
    const body = kind === 'band95' ? s('rect', {x: 0, y: 0, width: 24, height: 12, fill: '#1d5f7a', 'fill-opacity': .15})
        : kind === 'band80' ? s('rect', {x: 0, y: 0, width: 24, height: 12, fill: '#1d5f7a', 'fill-opacity': .35})
        : kind === 'dot' ? s('circle', {cx: 12, cy: 6, r: 4, fill: color, 'fill-opacity': .6, stroke: color})
        : kind === 'bar' ? s('rect', {x: 0, y: 0, width: 24, height: 12, fill: i % 2 ? `url(#${hatchId})` : color, stroke: color})
        : s('line', {x1: 0, x2: 24, y1: 6, y2: 6, stroke: color, 'stroke-width': 3, 'stroke-dasharray': DASHES[kind] || null});
    return s('svg', {viewBox: '0 0 24 12', 'aria-hidden': 'true'}, body, kind === 'bar' ? hatch(hatchId) : null);
}

function hatch(id) {
    return s('defs', {}, s('pattern', {id, width: 6, height: 6, patternUnits: 'userSpaceOnUse', patternTransform: 'rotate(45)'},
        s('rect', {width: 6, height: 6, fill: '#fff'}), s('line', {x1: 0, y1: 0, x2: 0, y2: 6, stroke: INK[1], 'stroke-width': 3})));
}

function legend(items) {
    return h('ul', {class: 'chart-legend'}, items.map(([kind, i, words]) => h('li', {}, swatch(kind, i, `hatch-${++counter}`), words)));
}

function figure(title, svg, legendItems, x, xLabel, columns, format) {
    const rows = x.map((label, i) => i);
    const t = table({caption: `${title}: the numbers`, rows, columns: [{label: xLabel, value: i => x[i]},
        ...columns.map(c => ({label: c.label, num: true, value: i => c.values[i] === null || c.values[i] === undefined ? '–' : format(c.values[i])}))]});
    return h('figure', {class: 'chart'}, h('figcaption', {}, title), h('div', {}, svg, legend(legendItems)), t);
}

export function lineChart({title, x, xLabel, yLabel, series = [], bands = [], marker, format = v => num(v, 1), cell = format}) {
    const all = [...series.flatMap(r => r.values), ...bands.flatMap(b => [...b.lower, ...b.upper])];
    const f = frame(x, all, yLabel, xLabel, format);
    const px = i => M.left + (x.length <= 1 ? f.innerW / 2 : (i / (x.length - 1)) * f.innerW);
    const sorted = [...bands].sort((a, b) => b.level - a.level);
    const areas = sorted.map(b => {
        const idx = x.map((_, i) => i).filter(i => b.lower[i] !== null && b.lower[i] !== undefined && b.upper[i] !== null && b.upper[i] !== undefined);
        const top = idx.map(i => `${px(i)},${f.y(b.upper[i])}`);
        const bottom = idx.reverse().map(i => `${px(i)},${f.y(b.lower[i])}`);
        return s('polygon', {points: [...top, ...bottom].join(' '), fill: '#1d5f7a', 'fill-opacity': b.level >= 95 ? .15 : .35});
    });
    const gap = v => v === null || v === undefined;
    const lines = series.map((r, k) => s('path', {
        d: r.values.map((v, i) => gap(v) ? '' : `${i === 0 || gap(r.values[i - 1]) ? 'M' : 'L'}${px(i)},${f.y(v)}`).join(''),
        fill: 'none', stroke: INK[k % INK.length], 'stroke-width': 2.5, 'stroke-dasharray': r.dotted ? '2 4' : r.dashed ? '7 4' : null}));
    const xTicks = x.map((label, i) => i % f.every === 0 ? s('text', {x: px(i), y: M.top + f.innerH + 16, 'text-anchor': 'middle', class: 'chart-axis'}, label) : null);
    const mark = marker ? s('g', {}, s('line', {x1: px(marker.at), x2: px(marker.at), y1: M.top, y2: M.top + f.innerH, stroke: '#555', 'stroke-dasharray': '3 3'}),
        s('text', {x: px(marker.at) + 4, y: M.top + 12, class: 'chart-axis'}, marker.label)) : null;
    const svg = svgFor(title, [f.g, areas, lines, xTicks, mark]);
    const legendItems = [...series.map((r, k) => [styleOf(r), k, `${r.name} (${STYLE_WORDS[styleOf(r)]})`]),
        ...sorted.map(b => [b.level >= 95 ? 'band95' : 'band80', 0, `${b.name} (${b.level >= 95 ? 'lighter' : 'darker'} band)`])];
    const columns = [...series.map(r => ({label: r.name, values: r.values})),
        ...sorted.flatMap(b => [{label: `${b.name}: low`, values: b.lower}, {label: `${b.name}: high`, values: b.upper}])];
    return figure(title, svg, legendItems, x, xLabel, columns, cell);
}

export function fanChart({title, x, xLabel, yLabel, centre, centreName = 'Median', range80, range95, extra = [], format, cell}) {
    return lineChart({title, x, xLabel, yLabel, format, cell, series: [{name: centreName, values: centre}, ...extra],
        bands: [{name: '95 % range', level: 95, lower: range95[0], upper: range95[1]},
            {name: '80 % range', level: 80, lower: range80[0], upper: range80[1]}]});
}

export function barChart({title, x, xLabel, yLabel, series, format = v => num(v, 1), cell = format}) {
    const f = frame(x, series.flatMap(r => r.values), yLabel, xLabel, format);
    const slot = f.innerW / Math.max(1, x.length);
    const barW = Math.max(2, (slot * 0.75) / series.length);
    const hatchId = `hatch-${++counter}`;
    const bars = series.map((r, k) => r.values.map((v, i) => {
        if (v === null || v === undefined) {
            return null;
        }
        const top = Math.min(f.y(v), f.y(0));
        return s('rect', {x: M.left + i * slot + slot * 0.125 + k * barW, y: top, width: barW - 1,
            height: Math.max(0, Math.abs(f.y(0) - f.y(v))), fill: k % 2 ? `url(#${hatchId})` : INK[k % INK.length], stroke: INK[k % INK.length]});
    }));
    const xTicks = x.map((label, i) => i % f.every === 0 ? s('text', {x: M.left + (i + 0.5) * slot, y: M.top + f.innerH + 16, 'text-anchor': 'middle', class: 'chart-axis'}, label) : null);
    const svg = svgFor(title, [hatch(hatchId), f.g, bars, xTicks]);
    return figure(title, svg, series.map((r, k) => ['bar', k, `${r.name} (${k % 2 ? 'hatched' : 'solid'} bars)`]),
        x, xLabel, series.map(r => ({label: r.name, values: r.values})), cell);
}

export function scatterChart({title, xLabel, yLabel, points, diagonal = false, pointName = 'Point', format = v => num(v, 1)}) {
    const xs = points.map(p => p.x), ys = points.map(p => p.y);
    // One scale for both axes when the diagonal matters, so y = x runs corner to corner.
    const f = frame([], diagonal ? [...xs, ...ys] : ys, yLabel, xLabel, format);
    const ticks = niceTicks(Math.min(0, ...(diagonal ? [...xs, ...ys] : xs)), Math.max(0, ...(diagonal ? [...xs, ...ys] : xs)));
    const lo = ticks[0], hi = ticks[ticks.length - 1];
    const px = v => M.left + ((v - lo) / (hi - lo)) * f.innerW;
    const xTicks = ticks.map(t => s('text', {x: px(t), y: M.top + f.innerH + 16, 'text-anchor': 'middle', class: 'chart-axis'}, format(t)));
    const line = diagonal ? s('line', {x1: px(Math.max(lo, 0)), y1: f.y(Math.max(lo, 0)), x2: px(hi), y2: f.y(hi),
        stroke: INK[2], 'stroke-width': 1.5, 'stroke-dasharray': '6 4'}) : null;
    const dots = points.map(p => s('circle', {cx: px(p.x), cy: f.y(p.y), r: 4, fill: INK[0], 'fill-opacity': .6, stroke: INK[0]},
        s('title', {}, `${p.label}: ${format(p.x)}, ${format(p.y)}`)));
    const svg = svgFor(title, [f.g, xTicks, line, dots]);
    const legendItems = [['dot', 0, `${pointName} (dot)`], ...(diagonal ? [['dashed', 2, 'Where the two are equal (dashed line)']] : [])];
    return figure(title, svg, legendItems, points.map(p => p.label), pointName,
        [{label: xLabel, values: xs}, {label: yLabel, values: ys}], format);
}
