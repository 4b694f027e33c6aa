import 'fake-indexeddb/auto';
import { describe, expect, it } from 'vitest';
import {
  MAX_DESIGN_FILE_BYTES,
  designFileName,
  designFileText,
  reportJsonFileName,
} from '../../../app/storage/designFile.ts';
import { newDesign } from '../../../rules/model/newDesign.ts';
import { readDesign } from '../../../rules/model/reader.ts';
import { dump } from './support.ts';
import { dbName, tab } from './sessionSupport.ts';

const good = {
  ...newDesign('Irrigation valve board'),
  parts: [{ id: 'U1', label: 'Valve driver', rail: '5v0', profile: '74hc', pins: [] }],
};

describe('importing a design file', () => {
  it.each([
    { name: 'not JSON', file: new File(['{"format": "railcross.design",'], 'broken.json'), path: '(root)' },
    {
      name: 'another kind of JSON',
      file: new File([JSON.stringify({ format: 'something.else', version: 1 })], 'other.json'),
      path: 'format',
    },
    {
      name: 'a newer format version',
      file: new File([JSON.stringify({ ...newDesign(), version: 99 })], 'future.json'),
      path: 'version',
    },
    {
      name: 'a part on an unknown rail',
      file: new File([JSON.stringify({ ...good, parts: [{ ...good.parts[0], rail: '12v' }] })], 'bad-rail.json'),
      path: 'parts[0].rail',
    },
    {
      name: 'a file over 20 MB',
      file: new File([new Uint8Array(MAX_DESIGN_FILE_BYTES + 1)], 'huge.json'),
      path: '(root)',
    },
  ])(
    'refuses $name, naming the place, and leaves everything stored byte for byte as it was',
    async ({ file, path }) => {
      const session = await tab(dbName());
      const db = session.library!.db;
      await session.flush();
      const before = await dump(db);
      const openBefore = session.openId;

      expect(await session.importFile(file)).toBe(false);

      expect(await dump(db)).toBe(before);
      expect(session.openId).toBe(openBefore);
      const notice = session.state.getState().notices.find((n) => n.key === 'import');
      expect(notice?.tone).toBe('error');
      expect(notice?.title).toContain(file.name);
      expect(notice?.lines.some((l) => l.startsWith(`${path}: `))).toBe(true);
    },
  );

  it('accepts a valid file as a new design and opens it, never replacing another', async () => {
    const session = await tab(dbName());
    const library = session.library!;
    const firstId = session.openId!;
    const first = await library.open(firstId);
    // Same title as the design already stored: still a design of its own.
    const text = designFileText({ ...good, title: first.ok ? first.design.title : '' });

    expect(await session.importFile(new File([text], 'valve.railcross.json'))).toBe(true);

    const { designs } = await library.list();
    expect(designs).toHaveLength(2);
    expect(session.openId).not.toBe(firstId);
    expect(session.editor.getState().design.parts.map((p) => p.id)).toEqual(['U1']);
    const again = await library.open(firstId);
    expect(again.ok && first.ok && again.design).toEqual(first.ok && first.design);
  });
});

describe('file names and the exported text', () => {
  it.each([
    {
      title: 'Greenhouse irrigation controller',
      design: 'greenhouse-irrigation-controller.railcross.json',
      report: 'greenhouse-irrigation-controller-report.json',
    },
    {
      title: 'Pumpe 3 – Wärmetauscher (Rev. B)',
      design: 'pumpe-3-warmetauscher-rev-b.railcross.json',
      report: 'pumpe-3-warmetauscher-rev-b-report.json',
    },
    { title: '../../etc/passwd', design: 'etc-passwd.railcross.json', report: 'etc-passwd-report.json' },
    { title: '   ', design: 'railcross-design.railcross.json', report: 'railcross-report.json' },
    { title: 'ΩΩΩ', design: 'railcross-design.railcross.json', report: 'railcross-report.json' },
  ])('"$title"', ({ title, design, report }) => {
    expect(designFileName(title)).toBe(design);
    expect(reportJsonFileName(title)).toBe(report);
  });

  it('exports the canonical text, which reads back to the same design', () => {
    const text = designFileText(good);
    expect(text.startsWith('{\n  "format": "railcross.design",\n  "version": 2,\n  "title": ')).toBe(true);
    const read = readDesign(text);
    expect(read.ok && read.design).toEqual(good);
  });
});
