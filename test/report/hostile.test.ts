/**
 * The text and Markdown renderers under hostile text (issue 14): a megabyte of white space in
 * a title, long runs of backticks in a net id, unbroken 10,000-character labels and notes,
 * right-to-left text and combining marks. Each must give its output, escaped as it should be.
 *
 * Speed is never asserted by a time here. The inputs are sized so that the old quadratic code
 * could not finish within vitest's default timeout (a 200,000-space title took a minute through
 * the old Markdown renderer; a megabyte takes about 25 times as long), while linear code
 * finishes in well under a second: a regression fails by timing out, not by a stopwatch.
 */
import { describe, expect, it } from 'vitest';
import { check } from '../../rules/check/check.ts';
import type { Design } from '../../rules/model/schema.ts';
import { buildReport } from '../../rules/report/buildReport.ts';
import { codeSpan, escapeMarkdown, oneLine, renderMarkdown } from '../../rules/report/renderMarkdown.ts';
import { renderText } from '../../rules/report/renderText.ts';
import { design, input, net, output, part, rail3v3, rail5v0 } from '../support/build.ts';
import { FIXED_TIME } from './fixtures.ts';

const MB = 1 << 20;
const RTL = '\u05e9\u05e2\u05d5\u05df \u0645\u0636\u062e\u0629'; // Hebrew and Arabic words
const COMBINING = 'e\u0301\u0302\u0303a\u0308\u20dd';

/** A 5 V output into a 3.3 V input with the given names: findings, a crossing, a waiver. */
function hostile(over: { title?: string; netId?: string; label?: string; note?: string; partLabel?: string }): Design {
  const netId = over.netId ?? 'N';
  return design({
    title: over.title ?? 'Hostile',
    rails: [rail5v0, rail3v3],
    parts: [
      part('D', '5v0', '74hc', [output('Y')], { label: over.partLabel ?? 'driver' }),
      part('R', '3v3', 'lvcmos33', [input('A')]),
    ],
    nets: [
      net(netId, ['D.Y', 'R.A'], {
        ...(over.label === undefined ? {} : { label: over.label }),
        ...(over.note === undefined ? {} : { waivers: [{ rule: 'rail-crossing', note: over.note }] }),
      }),
    ],
  });
}

function render(d: Design) {
  const report = buildReport(d, check(d), { failOn: 'error', generatedAt: FIXED_TIME });
  return { report, text: renderText(report), md: renderMarkdown(report) };
}

describe('white space', () => {
  it('a title of a megabyte of spaces with line breaks inside and around', () => {
    const spaces = ' '.repeat(MB / 2);
    const title = `${spaces}start${spaces}\n${spaces}end\r\n${' \t'.repeat(1000)}`;
    const { md, text } = render(hostile({ title }));
    // Markdown's heading is one line: each break with its surrounding white space became one space.
    const heading = md.split('\n')[0]!;
    expect(heading.startsWith('# Railcross check: ')).toBe(true);
    expect(heading).toContain('start end');
    expect(heading.endsWith('end ')).toBe(true);
    // The text rendering keeps the title as written.
    expect(text).toContain(`start${spaces}\n${spaces}end`);
  });

  it.each([
    ['spaces around one break', 'a   \n   b', 'a b'],
    ['several breaks and spaces', 'a \n\n \r\n b', 'a b'],
    ['no break', 'a    b', 'a    b'],
    ['a break at each end', '\n a \n', ' a '],
    ['other white space around a break', 'a\u00a0\t\u2028\nb', 'a b'],
    ['a megabyte of spaces without a break', ' '.repeat(MB), ' '.repeat(MB)],
    ['a megabyte of spaces with a break at the end', `${' '.repeat(MB)}x${' '.repeat(MB)}\n`, `${' '.repeat(MB)}x `],
  ])('oneLine: %s', (_name, input, expected) => {
    expect(oneLine(input)).toBe(expected);
  });
});

describe('backticks', () => {
  it.each([
    ['one run of 300,000 backticks', '`'.repeat(300_000), 300_001],
    ['300,000 runs of one backtick', 'a`'.repeat(300_000), 2],
    ['runs of growing length', Array.from({ length: 500 }, (_, k) => '`'.repeat(k + 1)).join('x'), 501],
  ])('codeSpan: %s is fenced by a longer run', (_name, id, fence) => {
    const span = codeSpan(id);
    expect(span.startsWith('`'.repeat(fence))).toBe(true);
    expect(span.startsWith('`'.repeat(fence + 1))).toBe(false);
    expect(span.endsWith('`'.repeat(fence))).toBe(true);
  });

  it('a net id of 300,000 backtick runs renders in Markdown (stack overflow before)', () => {
    const netId = 'x`'.repeat(300_000);
    const { md } = render(hostile({ netId }));
    expect(md).toContain(`\`\` ${netId} \`\``.replace(/ `` $/, ''));
  });
});

describe('long unbroken names, right-to-left text and combining marks', () => {
  const long = 'W'.repeat(10_000);
  const { report, text, md } = render(
    hostile({ label: `${long}|*${RTL}${COMBINING}`, note: `${long}_${RTL}${COMBINING}<b>`, partLabel: long }),
  );

  it('the report keeps them whole', () => {
    expect(report.crossings[0]!.label).toBe(`${long}|*${RTL}${COMBINING}`);
    expect(report.findings.find((f) => f.rule === 'rail-crossing')!.waived).toBe(`${long}_${RTL}${COMBINING}<b>`);
  });

  it('text carries them as written', () => {
    expect(text).toContain(`${long}|*${RTL}${COMBINING}`);
    expect(text).toContain(`Waived: ${long}_${RTL}${COMBINING}<b>`);
  });

  it('Markdown escapes the markup and keeps the rest', () => {
    expect(md).toContain(`${long}\\|\\*${RTL}${COMBINING}`);
    // The underscore sits between two letters, so GFM would not read it as emphasis: left as is.
    expect(md).toContain(`${long}_${RTL}${COMBINING}\\<b\\>`);
  });

  it('a long cell does not pad every other row of a text table to its width', () => {
    const many = design({
      title: 't',
      rails: [rail5v0, rail3v3],
      parts: Array.from({ length: 200 }, (_, k) => [
        part(`D${k}`, '5v0', '74hc', [output('Y')]),
        part(`R${k}`, '3v3', 'lvcmos33', [input('A')]),
      ]).flat(),
      nets: Array.from({ length: 200 }, (_, k) => net(`N${k}`, [`D${k}.Y`, `R${k}.A`], k === 0 ? { label: long } : {})),
    });
    const out = render(many).text;
    const rows = out.split('\n').filter((l) => /^ {2}N\d+ /.test(l));
    expect(rows).toHaveLength(200);
    expect(rows.filter((l) => l.length > 400)).toHaveLength(1);
  });
});

describe('escapeMarkdown', () => {
  it.each([
    ['a table bar', 'a|b', 'a\\|b'],
    ['emphasis', '*x*', '\\*x\\*'],
    ['markup', '<script>', '\\<script\\>'],
    ['an underscore inside a word is left', 'VALVE_EN', 'VALVE_EN'],
    ['an underscore at a word end', '_x_', '\\_x\\_'],
    ['right-to-left and combining marks untouched', `${RTL}${COMBINING}`, `${RTL}${COMBINING}`],
    ['line breaks become a space', 'a\n\nb', 'a b'],
  ])('%s', (_name, input, expected) => {
    expect(escapeMarkdown(input)).toBe(expected);
  });
});
