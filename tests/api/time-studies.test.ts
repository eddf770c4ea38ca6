// Time studies over HTTP against the real database: CSV uploads in their usual dialects become stored
// samples with an analysis; bad files get 400, 413 or 415 naming what is wrong and where; roles and
// organisations decide who may upload, read and delete.
import { describe, expect, it } from 'vitest';
import { apiErrorSchema } from '../../shared/api/errors';
import { apiRoutes } from '../../shared/api/routes';
import { timeStudyDetailSchema, timeStudyListSchema } from '../../shared/api/time-studies';
import { AuditEntryEntity, TimeStudyEntity } from '../../server/db/entities';
import type { Agent } from './fixtures/app';
import { useCleanDatabase } from './fixtures/database';
import { ACTORS, useOrganisation, type Actor } from './fixtures/world';

const db = useCleanDatabase({ truncate: false });
const org = useOrganisation(db, { contentPerTest: false });

function upload(
  agent: Agent,
  file: { content: string | Buffer; name: string },
  fields: Record<string, string> = { stationId: 'press' },
) {
  let request = agent.post(apiRoutes.scenarioTimeStudies(org.content.scenarioId));
  for (const [key, value] of Object.entries(fields)) request = request.field(key, value);
  return request.attach('file', Buffer.isBuffer(file.content) ? file.content : Buffer.from(file.content), file.name);
}

function errorOf(res: { body: unknown }) {
  return apiErrorSchema.parse(res.body).error;
}

const PRESS_CSV = ['operator;cycle_s;note', 'A;9,2;', 'A;9,8;', 'B;10,4;warm', 'B;8,9;', 'A;11,1;', 'B;9,6;'].join(
  '\r\n',
);
const PRESS_TIMES = [9.2, 9.8, 10.4, 8.9, 11.1, 9.6];

describe('uploading a time study', () => {
  it('stores the samples of the named column and answers with the statistics and fitted candidates', async () => {
    const res = await upload(
      org.people.engineer.agent,
      { content: PRESS_CSV, name: 'press-week-12.csv' },
      { stationId: 'press', name: 'Press, week 12' },
    );
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const study = timeStudyDetailSchema.parse(res.body);
    expect(study).toMatchObject({
      stationId: 'press',
      name: 'Press, week 12',
      fileName: 'press-week-12.csv',
      column: 'cycle_s',
      count: 6,
    });
    expect(study.samples).toEqual(PRESS_TIMES);
    const mean = PRESS_TIMES.reduce((a, b) => a + b, 0) / 6;
    expect(study.analysis.summary.mean).toBeCloseTo(mean, 12);
    expect(study.analysis.summary.sd).toBeCloseTo(
      Math.sqrt(PRESS_TIMES.reduce((a, x) => a + (x - mean) ** 2, 0) / 5),
      12,
    );
    expect(study.analysis.summary).toMatchObject({ min: 8.9, max: 11.1 });
    expect(study.analysis.candidates.map((c) => c.kind).sort()).toEqual(['gamma', 'lognormal', 'normal']);
    const audit = await db()
      .getRepository(AuditEntryEntity)
      .findOneByOrFail({ entityId: org.content.scenarioId, action: 'update' });
    expect(audit.detail).toMatchObject({
      change: 'time study added',
      timeStudyId: study.id,
      stationId: 'press',
      samples: 6,
    });
  });

  it('reads tab-separated files, a one-column file with decimal commas, and headerless single columns', async () => {
    const tab = await upload(
      org.people.engineer.agent,
      { content: 'time\tshift\n12.5\t1\n13\t1\n11.75\t2\n', name: 'tab.txt' },
      { stationId: 'fit-1' },
    );
    expect(tab.status, JSON.stringify(tab.body)).toBe(201);
    expect(tab.body).toMatchObject({ column: 'time', samples: [12.5, 13, 11.75], name: 'tab' });
    const comma = await upload(
      org.people.engineer.agent,
      { content: 'seconds\n12,5\n13,0\n11,75\n', name: 'decimal-comma.csv' },
      { stationId: 'fit-1' },
    );
    expect(comma.body).toMatchObject({ column: 'seconds', samples: [12.5, 13, 11.75] });
    const bare = await upload(
      org.people.engineer.agent,
      { content: '4.1\n\n3.9\n4.4\n', name: 'bare.csv' },
      { stationId: 'fit-1' },
    );
    expect(bare.body).toMatchObject({ column: 'column 1', samples: [4.1, 3.9, 4.4] });
  });

  it('accepts exactly 100,000 rows and lists the study without its samples', async () => {
    const times = Array.from({ length: 100_000 }, (_, i) => 8 + (i % 97) / 25);
    const res = await upload(
      org.people.engineer.agent,
      { content: `cycle_s\n${times.join('\n')}\n`, name: 'full.csv' },
      { stationId: 'full' },
    );
    expect(res.status, JSON.stringify(res.body).slice(0, 300)).toBe(201);
    expect(res.body.count).toBe(100_000);
    expect(res.body.samples.slice(0, 3)).toEqual(times.slice(0, 3));
    const list = await org.people.viewer.agent
      .get(apiRoutes.scenarioTimeStudies(org.content.scenarioId))
      .query({ stationId: 'full' });
    expect(list.body).toHaveLength(1);
    expect(list.body[0].count).toBe(100_000);
  });

  it('takes the only numeric column when none is named like a cycle time', async () => {
    const res = await upload(
      org.people.engineer.agent,
      { content: 'operator,measured\nA,7.5\nB,8.25\n', name: 'only.csv' },
      { stationId: 'screw' },
    );
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ column: 'measured', samples: [7.5, 8.25] });
  });
});

describe('refusing bad files with the reason and the place', () => {
  it('a malformed row answers 400 naming the row and the column', async () => {
    const res = await upload(org.people.engineer.agent, {
      content: 'operator,cycle_s\nA,9.1\nB,9.4\nA,abc\nB,9.0\n',
      name: 'typo.csv',
    });
    expect(res.status).toBe(400);
    const error = errorOf(res);
    expect(error.code).toBe('bad_request');
    expect(error.message).toContain('row 4, column "cycle_s": "abc" is not a number');
    expect(error.fields).toEqual([{ path: 'file', message: 'row 4, column "cycle_s": "abc" is not a number' }]);
  });

  it('negative values are refused with their rows, blank lines skipped, and many problems counted', async () => {
    const rows = ['cycle', '-3', '', '5', ...Array.from({ length: 8 }, () => 'x')];
    const res = await upload(org.people.engineer.agent, { content: rows.join('\n'), name: 'bad.csv' });
    expect(res.status).toBe(400);
    const error = errorOf(res);
    expect(error.fields[0].message).toBe('row 2, column "cycle": -3 is below zero; a cycle time cannot be negative');
    expect(error.fields).toHaveLength(5);
    expect(error.message).toMatch(/^9 rows could not be read: .* \(and 4 more\)\.$/);
  });

  it('a short row is named as an empty cell, and a headerless decimal-comma column gets a hint', async () => {
    const short = await upload(org.people.engineer.agent, {
      content: 'operator;cycle\nA;9,5\nB\nA;9,9\n',
      name: 'short.csv',
    });
    expect(short.status).toBe(400);
    expect(errorOf(short).fields).toEqual([{ path: 'file', message: 'row 3, column "cycle": the cell is empty' }]);
    const ambiguous = await upload(org.people.engineer.agent, { content: '12,5\n13,0\n', name: 'ambiguous.csv' });
    expect(ambiguous.status).toBe(400);
    expect(errorOf(ambiguous).message).toContain('add a header row such as "cycle_s"');
  });

  it('no numeric column answers 400 listing the columns', async () => {
    const res = await upload(org.people.engineer.agent, {
      content: 'operator,note\nA,fine\nB,slow\n',
      name: 'notes.csv',
    });
    expect(res.status).toBe(400);
    expect(errorOf(res).message).toBe('No numeric column found; columns are: operator, note.');
    const several = await upload(org.people.engineer.agent, { content: 'lot,weight\n1,9.5\n2,9.7\n', name: 'two.csv' });
    expect(several.status).toBe(400);
    expect(errorOf(several).message).toContain(
      'Several numeric columns (lot, weight) and none is named like cycle, seconds or time',
    );
    const headerOnly = await upload(org.people.engineer.agent, { content: 'cycle_s\n\n', name: 'empty.csv' });
    expect(errorOf(headerOnly).message).toBe('The file has a header row but no cycle times below it.');
  });

  it('a file over 1 MB answers 413 saying its size and the limit', async () => {
    const big = Buffer.alloc(Math.round(3.2 * 1024 * 1024), '9.5\n');
    const res = await upload(org.people.engineer.agent, { content: big, name: 'big.csv' });
    expect(res.status).toBe(413);
    expect(errorOf(res).message).toMatch(/^The file is 3\.2 MB; the limit is 1 MB\./);
    const justOver = await upload(org.people.engineer.agent, {
      content: Buffer.alloc(1024 * 1024 + 10, '9.5\n'),
      name: 'just-over.csv',
    });
    expect(justOver.status).toBe(413);
    expect(errorOf(justOver).message).toMatch(
      /^The file is over 1 MB \(the upload is 1,048,\d{3} bytes\); the limit is 1 MB\./,
    );
  });

  it('more than 100,000 rows answers 413 with the row count', async () => {
    const res = await upload(org.people.engineer.agent, { content: '9\n'.repeat(100_001), name: 'long.csv' });
    expect(res.status).toBe(413);
    expect(errorOf(res).message).toContain('The file has 100,001 rows of times; the limit is 100,000');
  });

  it('a binary file answers 415 even with a .csv name, and another extension answers 415 naming the file', async () => {
    const png = Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]);
    const binary = await upload(org.people.engineer.agent, { content: png, name: 'times.csv' });
    expect(binary.status).toBe(415);
    expect(errorOf(binary).message).toContain('"times.csv" is not a text file');
    const sheet = await upload(org.people.engineer.agent, { content: 'cycle\n9\n', name: 'times.xlsx' });
    expect(sheet.status).toBe(415);
    expect(errorOf(sheet).fields).toEqual([{ path: 'file', message: 'must be a .csv or .txt file; got "times.xlsx"' }]);
  });

  it('a missing file, station id or multipart body answers with the field that is wrong', async () => {
    const noFile = await org.people.engineer.agent
      .post(apiRoutes.scenarioTimeStudies(org.content.scenarioId))
      .field('stationId', 'press');
    expect(noFile.status).toBe(400);
    expect(errorOf(noFile).fields).toEqual([{ path: 'file', message: 'is required' }]);
    const noStation = await upload(org.people.engineer.agent, { content: PRESS_CSV, name: 'p.csv' }, {});
    expect(noStation.status).toBe(400);
    expect(errorOf(noStation).fields).toEqual([{ path: 'stationId', message: 'is required' }]);
    const json = await org.people.engineer.agent
      .post(apiRoutes.scenarioTimeStudies(org.content.scenarioId))
      .send({ stationId: 'press' });
    expect(json.status).toBe(415);
    expect(errorOf(json).message).toContain('multipart/form-data');
    const wrongField = await org.people.engineer.agent
      .post(apiRoutes.scenarioTimeStudies(org.content.scenarioId))
      .field('stationId', 'press')
      .attach('upload', Buffer.from('9\n'), 'a.csv');
    expect(wrongField.status).toBe(400);
    expect(errorOf(wrongField).fields[0].path).toBe('upload');
  });
});

describe('who may see and change time studies', () => {
  it('a viewer cannot upload (403) but can list and read them', async () => {
    const refused = await upload(
      org.people.viewer.agent,
      { content: PRESS_CSV, name: 'v.csv' },
      { stationId: 'viewer-station' },
    );
    expect(refused.status).toBe(403);
    const made = await upload(
      org.people.owner.agent,
      { content: PRESS_CSV, name: 'o.csv' },
      { stationId: 'viewer-station' },
    );
    expect(made.status).toBe(201);
    const list = await org.people.viewer.agent
      .get(apiRoutes.scenarioTimeStudies(org.content.scenarioId))
      .query({ stationId: 'viewer-station' });
    expect(list.status).toBe(200);
    const items = timeStudyListSchema.parse(list.body);
    expect(items.map((s) => s.id)).toEqual([made.body.id]);
    expect(items[0]).not.toHaveProperty('samples');
    const detail = await org.people.viewer.agent.get(apiRoutes.timeStudy(made.body.id));
    expect(detail.status).toBe(200);
    expect(timeStudyDetailSchema.parse(detail.body).samples).toEqual(PRESS_TIMES);
  });

  it('another organisation gets 404 for the scenario’s studies and for a study’s id', async () => {
    const made = await upload(
      org.people.engineer.agent,
      { content: PRESS_CSV, name: 'o.csv' },
      { stationId: 'private' },
    );
    const outsider = org.people.outsider.agent;
    expect((await outsider.get(apiRoutes.scenarioTimeStudies(org.content.scenarioId))).status).toBe(404);
    expect((await upload(outsider, { content: PRESS_CSV, name: 'x.csv' })).status).toBe(404);
    expect((await outsider.get(apiRoutes.timeStudy(made.body.id))).status).toBe(404);
    expect((await outsider.delete(apiRoutes.timeStudy(made.body.id))).status).toBe(404);
    expect(await db().getRepository(TimeStudyEntity).countBy({ id: made.body.id })).toBe(1);
  });

  it('an engineer deletes a study (audited); a viewer may not', async () => {
    const made = await upload(
      org.people.engineer.agent,
      { content: PRESS_CSV, name: 'd.csv' },
      { stationId: 'doomed' },
    );
    expect((await org.people.viewer.agent.delete(apiRoutes.timeStudy(made.body.id))).status).toBe(403);
    const gone = await org.people.engineer.agent.delete(apiRoutes.timeStudy(made.body.id));
    expect(gone.status).toBe(200);
    expect(gone.body).toEqual({ ok: true });
    expect((await org.people.viewer.agent.get(apiRoutes.timeStudy(made.body.id))).status).toBe(404);
    const audit = await db().getRepository(AuditEntryEntity).findBy({ entityId: org.content.scenarioId });
    expect(audit.some((a) => a.detail.change === 'time study deleted' && a.detail.timeStudyId === made.body.id)).toBe(
      true,
    );
  });

  const expected: Record<'list' | 'read' | 'upload' | 'delete', Record<Actor, number>> = {
    list: { anonymous: 401, outsider: 404, viewer: 200, engineer: 200, owner: 200 },
    read: { anonymous: 401, outsider: 404, viewer: 200, engineer: 200, owner: 200 },
    upload: { anonymous: 401, outsider: 404, viewer: 403, engineer: 201, owner: 201 },
    delete: { anonymous: 401, outsider: 404, viewer: 403, engineer: 200, owner: 200 },
  };
  const rows = (Object.keys(expected) as Array<keyof typeof expected>).flatMap((action) =>
    ACTORS.map((actor) => ({ action, actor, status: expected[action][actor] })),
  );
  it.each(rows)('$action as $actor answers $status', async ({ action, actor, status }) => {
    const made = await upload(
      org.people.engineer.agent,
      { content: PRESS_CSV, name: 'm.csv' },
      { stationId: 'matrix' },
    );
    const agent = org.people.as(actor);
    const res = await {
      list: () => agent.get(apiRoutes.scenarioTimeStudies(org.content.scenarioId)),
      read: () => agent.get(apiRoutes.timeStudy(made.body.id)),
      upload: () => upload(agent, { content: PRESS_CSV, name: 'm.csv' }, { stationId: 'matrix' }),
      delete: () => agent.delete(apiRoutes.timeStudy(made.body.id)),
    }[action]();
    expect(res.status, JSON.stringify(res.body).slice(0, 200)).toBe(status);
    expect(res.headers['content-type']).toMatch(/application\/json/);
  });

  it('a malformed study id answers 400, an unknown one 404', async () => {
    expect((await org.people.viewer.agent.get(apiRoutes.timeStudy('not-a-uuid'))).status).toBe(400);
    expect(
      (await org.people.viewer.agent.get(apiRoutes.timeStudy('00000000-0000-4000-8000-000000000000'))).status,
    ).toBe(404);
  });
});
