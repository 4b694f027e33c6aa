/**
 * How the numbers were worked out, where the profiles' numbers come from, the rules applied,
 * and the cautions every report carries (rules-catalogue.md), in the report's own words.
 */
import { autoTable, type UserOptions } from 'jspdf-autotable';
import { RULES } from '../../checks/index.ts';
import { formatQuantity } from '../../levels/units.ts';
import type { Report } from '../reportSchema.ts';
import { paragraph, sectionHeading, subHeading, type Ctx } from './page.ts';
import { baseTableOptions } from './tables.ts';
import { INK, INK_2, SIZE, STATUS_COLOUR, type Rgb } from './theme.ts';

const rgb = (c: Rgb): [number, number, number] => [c[0], c[1], c[2]];

/** The worst-case method in a few sentences, with this report's settings in them. */
export function methodSentences(report: Report): string[] {
  const minMargin = formatQuantity(report.settings.minMargin, 'V');
  const wiring = formatQuantity(report.settings.defaultWiringCapacitance, 'F');
  return [
    'Each rail is taken over its whole range: nominal ± tolerance, or the minimum and maximum the design gives (the cover lists the ranges).',
    "A check that involves several rails is worked out at every combination of those rails' ends, and the worst combination is reported. " +
      'Levels are linear in the supply, so the worst case always lies at one of these corners.',
    'All pins on one rail share one supply voltage in each combination: a driver and a receiver on the same rail are judged at the same VDD, ' +
      "never at opposite ends of that rail's range.",
    'Output levels are the guaranteed ones. The other pins and the pull resistors on a net set the load current on each driver, and the level used ' +
      'is the one guaranteed at the smallest test current that covers that load. A load beyond the largest test current has no guarantee: it is a ' +
      'drive-load error, and the level is extrapolated from the last two test points and marked as an estimate.',
    'Noise margins are NMH = VOH − VIH and NML = VIL − VOL, each at its worst corner; a Schmitt-trigger input is judged by its upper threshold for ' +
      `the high level and its lower threshold for the low level. A margin below 0 V is an error, one below the minimum margin of ${minMargin} a warning.`,
    'Computed values are compared with their limits as equal when they agree to within 1e-9 of the larger magnitude, so a margin of exactly 0 V ' +
      'is a warning rather than an error, and a driver loaded exactly to its rating passes.',
    'In a power state with rails off, those rails are at 0 V: their pins drive nothing and are not judged as receivers; instead, the highest ' +
      'voltage the rest of the circuit can put on them is checked against what an unpowered pin tolerates.',
    'Edges are modelled as a single RC pole: 10–90 % in ln 9 × RC (about 2.2 RC) for a driven net, 30–70 % in ln(7/3) × RC (about 0.85 RC) for ' +
      `a net pulled up by a resistor. C is the sum of the pins' input capacitance and the wiring capacitance, ${wiring} per net unless the net gives its own.`,
  ];
}

function table(ctx: Ctx, y: number, options: UserOptions): number {
  autoTable(ctx.doc, { ...baseTableOptions(ctx, y), ...options });
  return (ctx.doc as unknown as { lastAutoTable: { finalY: number } }).lastAutoTable.finalY + 8;
}

/** Method, profiles and their sources, and the rules, from `y` on. */
export function drawMethod(ctx: Ctx, y: number, report: Report): number {
  let at = sectionHeading(ctx, y, 'Method and sources');
  at = subHeading(ctx, at, 'How the numbers were worked out');
  methodSentences(report).forEach((sentence, k) => {
    at = paragraph(ctx, at, sentence, { indent: 16, bullet: `${k + 1}.`, after: 3 });
  });

  at = subHeading(ctx, at + 6, `Profiles used (${report.profiles.length})`);
  at = paragraph(
    ctx,
    at,
    "Every number in a profile names its source; these are the profiles this design's pins resolve to.",
    { colour: INK_2 },
  );
  if (report.profiles.length === 0) at = paragraph(ctx, at, 'None: the design has no pins yet.');
  else {
    at = table(ctx, at, {
      head: [['Profile', 'Label', 'Source of its numbers']],
      body: report.profiles.map((p) => [p.id, p.label, p.source]),
      columnStyles: { 0: { cellWidth: 70, font: ctx.fonts.mono }, 1: { cellWidth: 130 }, 2: { cellWidth: 'auto' } },
    });
  }

  at = subHeading(ctx, at + 6, 'Rules applied');
  return table(ctx, at, {
    head: [['Rule', 'Checks that', 'Severity']],
    body: RULES.map((r) => [r.id, r.meta.title, r.meta.severity]),
    columnStyles: {
      0: { cellWidth: 80, font: ctx.fonts.mono },
      1: { cellWidth: 170 },
      2: { cellWidth: 'auto', textColor: rgb(INK_2) },
    },
  });
}

/** The cautions, always, as the report's last section. */
export function drawCautions(ctx: Ctx, y: number, report: Report): number {
  let at = sectionHeading(ctx, y, 'Cautions', 60);
  for (const caution of report.cautions)
    at = paragraph(ctx, at, caution, { indent: 16, bullet: '!', colour: INK, after: 5 });
  return paragraph(
    ctx,
    at + 4,
    'Nothing in this report replaces the datasheets of the parts chosen or the judgement of the engineer responsible for the design.',
    {
      colour: STATUS_COLOUR.info,
      size: SIZE.small,
    },
  );
}
