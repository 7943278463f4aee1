/*
 * sensors.js: words the officer's and the mechanic's pages share about pump sensors.
 *   stopCaution(reader)      the plain caution beside every list of pumps probably down; 'mechanic' for the one
 *                            who would make the trip, otherwise the officer's words
 *   downWords(pump)          "Probably down (87 % likely)"; never "100 %": a flag is a judgement, not a fact
 *   fellWords(pump)          "Use fell on 11 Oct 2026, 3 days ago"
 *   repairWords(pump)        whether a repair is open on a flagged pump, in words
 *   dueWords(row, today)     a service-due row's date in words: overdue, due today, or due on a day
 *   hoursWords(row)          "9,432 of 9,125 operating hours since the last service"
 */
import * as fmt from './format.js';
import {h} from './ui.js';

export function stopCaution(reader) {
    const next = reader === 'mechanic'
        ? 'Ask the community or the pump\'s caretaker before making the trip, and report it broken only once you or '
            + 'they have seen that it is.'
        : 'Ask the community or the area mechanic before sending anyone, and treat the parts as an estimate of what a '
            + 'repair is likely to need, not a diagnosis.';
    return h('p', {class: 'message sensor-caution'}, 'Probably down, not known to be: a sensor can fail or a pump can '
        + `stand idle. ${next} Repairs follow trained, licensed practice and local rules.`);
}

export function downWords(pump) {
    const p = Number(pump.probabilityDown);
    // 0.9998 rounds to "100 %", which reads as certain beside the caution that it is not known.
    return `Probably down (${p >= 0.995 ? 'over 99 %' : fmt.percent(p, 0)} likely)`;
}

export function fellWords(pump) {
    const days = Number(pump.daysSinceUseFell);
    const ago = days === 0 ? 'today' : days === 1 ? '1 day ago' : `${fmt.num(days)} days ago`;
    return `Use fell on ${fmt.date(pump.stoppedFrom)}, ${ago}`;
}

export function repairWords(pump) {
    return pump.openRepairRef ? `Repair ${pump.openRepairRef} reported: the flag closes at the next check`
        : 'No repair reported';
}

export function dueWords(row, today) {
    if (!row.dueOn) {
        return 'Not in use: no service falls due';
    }
    if (row.dueOn < today) {
        return `Overdue since ${fmt.date(row.dueOn)}`;
    }
    return row.dueOn === today ? 'Due today' : `Due ${fmt.date(row.dueOn)}`;
}

export function hoursWords(row) {
    return `${fmt.num(row.hoursSinceService)} of ${fmt.num(row.serviceIntervalHours)} operating hours since the last service`;
}
