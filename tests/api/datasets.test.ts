// Uploaded radial data: CSV upload with units converted to atomic units (CODATA 2022 a0 =
// 52.9177210544 pm, /work/shared/REFERENCE.md "Bohr radius"), line-numbered refusals that store
// nothing, role checks on every route, and a radial figure drawing a data set.
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { datasetSchema, datasetSummarySchema } from '../../shared/api/datasets';
import { demo, signedIn, type ApiClient } from '../support/api-client';
import { startTestServer, type TestServer } from '../support/test-server';

const A0_PM = 52.9177210544;

let server: TestServer;
let seeded: number[];
let owner: ApiClient, editor: ApiClient, reviewer: ApiClient, viewer: ApiClient, admin: ApiClient;
let dataProject: number;

beforeAll(async () => {
  server = await startTestServer(inject('databaseUrl'));
  seeded = await server.db('projects').pluck('id');
  [owner, editor, reviewer, viewer, admin] = await Promise.all(
    [demo.owner, demo.editor, demo.reviewer, demo.viewer, demo.admin].map((e) =>
      signedIn(server.baseUrl, e),
    ),
  );
  // A project of its own, so the demo projects stay as other test files expect them.
  dataProject = (await owner.post('/api/projects', { name: 'Radial data' })).body.id;
  for (const [email, role] of [
    [demo.editor, 'editor'],
    [demo.reviewer, 'reviewer'],
    [demo.viewer, 'viewer'],
  ])
    expect((await owner.post(`/api/projects/${dataProject}/members`, { email, role })).status).toBe(
      201,
    );
});
afterAll(async () => {
  // Projects made here are archived, so other test files see the demo users' project lists as seeded.
  await server.db('projects').whereNotIn('id', seeded).update({ archived_at: server.db.fn.now() });
  await server.stop();
});

const uploadCsv = (
  c: ApiClient,
  csv: string,
  fields: Record<string, string> = { name: 'Hartree–Fock 2s' },
  projectId = dataProject,
) =>
  c.upload(
    `/api/projects/${projectId}/datasets`,
    { field: 'file', name: 'data.csv', content: csv, type: 'text/csv' },
    fields,
  );

const datasetRows = async () => Number((await server.db('datasets').count('* as n').first())?.n);

/** Hydrogen 1s, R = 2e^(-r/a0)/a0^(3/2), tabulated in pm (R_10 of REFERENCE.md, Z = 1). */
const onesPm = [0, 20, 40, 60, 80, 100, 150, 200, 300];
const onesCsv = [
  'r / pm, R / pm^-3/2',
  ...onesPm.map((r) => `${r},${(2 * Math.exp(-r / A0_PM)) / Math.pow(A0_PM, 1.5)}`),
].join('\n');

describe('upload', () => {
  it('when an editor uploads R in pm, then it is stored in bohr and bohr^-3/2 and the audit trail says so', async () => {
    const r = await uploadCsv(editor, onesCsv, { name: 'Tabulated 1s' });
    expect(r.status).toBe(201);
    const d = datasetSchema.parse(r.body);
    expect(d).toMatchObject({
      name: 'Tabulated 1s',
      quantity: 'R',
      rUnit: 'pm',
      valueUnit: 'pm^-3/2',
      points: onesPm.length,
      createdBy: 'Ravi Mendes',
    });
    d.r.forEach((rb, i) => {
      expect(Math.abs(rb - onesPm[i] / A0_PM)).toBeLessThan(1e-15 * Math.max(1, rb));
      expect(Math.abs(d.values[i] - 2 * Math.exp(-rb)) / (2 * Math.exp(-rb))).toBeLessThan(1e-14);
    });
    expect(d.rMaxBohr).toBeCloseTo(300 / A0_PM, 14);
    const audit = await server
      .db('audit_entries')
      .where({ project_id: dataProject, action: 'dataset.uploaded' })
      .orderBy('id');
    expect(audit.at(-1).summary).toMatch(/"Tabulated 1s" \(R, 9 points, pm \/ pm\^-3\/2\)/);
  });

  it('when the header has no units, then the form fields give them', async () => {
    const r = await uploadCsv(
      editor,
      'r,V\n1,-27.211386245981\n2,-13.6056931229905\n4,-6.80284656149525\n',
      {
        name: 'Coulomb in eV',
        rUnit: 'bohr',
        valueUnit: 'eV',
      },
    );
    expect(r.status).toBe(201);
    expect(r.body.values[0]).toBeCloseTo(-1, 14);
  });

  it('when rows are bad, then 422 lists each problem with its line and nothing is stored', async () => {
    const before = await datasetRows();
    const r = await uploadCsv(editor, 'r_bohr,R_bohr^-3/2\n0,1\n1,NaN\n0.5,2\n');
    expect(r.status).toBe(422);
    expect(r.body.error.code).toBe('invalid_csv');
    expect(r.body.error.fields.file).toBe('line 3: R "NaN" is not a finite decimal number');
    expect(r.body.error.details.problems).toEqual([
      { line: 3, field: 'file', message: 'R "NaN" is not a finite decimal number' },
      { line: 4, field: 'file', message: 'r must increase from row to row, but 0.5 follows 1' },
    ]);
    const units = await uploadCsv(editor, 'r,R\n0,1\n1,2\n2,3\n');
    expect(units.status).toBe(422);
    expect(Object.keys(units.body.error.fields).sort()).toEqual(['rUnit', 'valueUnit']);
    expect(await datasetRows()).toBe(before);
  });

  it('when the name or the file is missing, or the file is too large, then the field is named and nothing is stored', async () => {
    const before = await datasetRows();
    const noName = await uploadCsv(editor, onesCsv, { name: ' ' });
    expect(noName.status).toBe(400);
    expect(noName.body.error.fields.name).toBe('give the data set a name');
    const noFile = await editor.post(`/api/projects/${dataProject}/datasets`, { name: 'x' });
    expect(noFile.status).toBe(400);
    expect(noFile.body.error.fields.file).toMatch(/choose a CSV file/);
    const big = await uploadCsv(editor, 'r_bohr,R_bohr^-3/2\n' + '1,1\n'.repeat(600_000));
    expect(big.status).toBe(413);
    expect(big.body.error.message).toBe('the CSV file is larger than 2 MB; nothing was changed');
    expect(await datasetRows()).toBe(before);
  });
});

describe('roles', () => {
  it('when a viewer or reviewer uploads, then 403; outsiders get 404 on every route', async () => {
    const before = await datasetRows();
    expect((await uploadCsv(viewer, onesCsv)).status).toBe(403);
    expect((await uploadCsv(reviewer, onesCsv)).status).toBe(403);
    expect((await uploadCsv(admin, onesCsv)).status).toBe(404);
    expect(await datasetRows()).toBe(before);
    const id = (await viewer.get(`/api/projects/${dataProject}/datasets`)).body[0].id;
    expect((await admin.get(`/api/projects/${dataProject}/datasets`)).status).toBe(404);
    expect((await admin.get(`/api/datasets/${id}`)).status).toBe(404);
    expect((await admin.delete(`/api/datasets/${id}`)).status).toBe(404);
    expect((await viewer.delete(`/api/datasets/${id}`)).status).toBe(403);
    expect((await reviewer.delete(`/api/datasets/${id}`)).status).toBe(403);
    expect(await datasetRows()).toBe(before);
  });

  it('when a viewer lists and opens data sets, then the list has no points and the data set has them', async () => {
    const list = (await viewer.get(`/api/projects/${dataProject}/datasets`)).body;
    expect(list.length).toBeGreaterThanOrEqual(2);
    const first = datasetSummarySchema.strict().parse(list[0]);
    const one = datasetSchema.parse((await viewer.get(`/api/datasets/${first.id}`)).body);
    expect(one.r).toHaveLength(first.points);
  });

  it('when an editor deletes a data set, then it is gone', async () => {
    const id = (await uploadCsv(editor, onesCsv, { name: 'Temporary' })).body.id;
    expect((await editor.delete(`/api/datasets/${id}`)).status).toBe(204);
    expect((await viewer.get(`/api/datasets/${id}`)).status).toBe(404);
  });
});

describe('radial figures drawing data', () => {
  const spec = (datasets: { id: number; label?: string }[]) => ({
    schemaVersion: 1,
    state: { terms: [{ n: 1, l: 0, m: 0 }] },
    kind: { type: 'radial', curves: [{ n: 1, l: 0, quantity: 'R' }], rMax: 6, datasets },
    print: { formats: ['svg'] },
  });
  const svgOf = async (figureId: number) => {
    const r = await viewer.getBytes(`/api/figures/${figureId}/render?format=svg`);
    expect(r.status).toBe(200);
    return {
      text: r.bytes.toString('utf8'),
      notes: JSON.parse(decodeURIComponent(r.headers.get('x-lobewright-notes') ?? '[]')),
    };
  };

  it('when a radial figure names a data set, then its SVG draws it with the legend label, and deleting the data set is refused while drawn', async () => {
    const data = (await uploadCsv(editor, onesCsv, { name: 'Tabulated 1s' })).body;
    const fig = (
      await editor.post(`/api/projects/${dataProject}/figures`, {
        title: 'R of 1s with data',
        spec: spec([{ id: data.id }]),
      })
    ).body;
    const svg = await svgOf(fig.id);
    expect(svg.text).toContain('>Tabulated 1s</tspan>');
    expect(svg.text).toContain('data &quot;Tabulated 1s&quot;');
    expect(svg.notes).toEqual([]);

    const labelled = (
      await editor.post(`/api/projects/${dataProject}/figures`, {
        title: 'Labelled',
        spec: spec([{ id: data.id, label: 'HF 1s' }]),
      })
    ).body;
    expect((await svgOf(labelled.id)).text).toContain('>HF 1s</tspan>');

    const refused = await editor.delete(`/api/datasets/${data.id}`);
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('dataset_in_use');
    expect((await viewer.get(`/api/datasets/${data.id}`)).status).toBe(200);
  });

  it('when a figure names a data set of another project, then 422 names the field and nothing is stored', async () => {
    const other = (await owner.post('/api/projects', { name: 'Other data' })).body.id;
    const foreign = (await uploadCsv(owner, onesCsv, { name: 'Foreign data' }, other)).body;
    const before = Number((await server.db('figures').count('* as n').first())?.n);
    const r = await editor.post(`/api/projects/${dataProject}/figures`, {
      title: 'Foreign',
      spec: spec([{ id: foreign.id }]),
    });
    expect(r.status).toBe(422);
    expect(r.body.error.fields).toEqual({
      'spec.kind.datasets.0.id': `data set ${foreign.id} is not in this project`,
    });
    expect(Number((await server.db('figures').count('* as n').first())?.n)).toBe(before);
  });

  it('when a project with data is carried by a bundle, then the new project gets the data, its figures draw the copies with the same SVG bytes, and a second import adds nothing', async () => {
    const bytes = (await editor.getBytes(`/api/projects/${dataProject}/bundle`)).bytes;
    const bundle = JSON.parse(bytes.toString('utf8'));
    const held = (await editor.get(`/api/projects/${dataProject}/datasets`)).body.length;
    expect(bundle.datasets).toHaveLength(held);
    const first = await editor.upload('/api/projects/import', {
      field: 'bundle',
      name: 'b.json',
      content: bytes,
    });
    expect(first.status).toBe(201);
    // Data sets identical in name, units and points (uploaded twice above) become one.
    const distinct = new Set(
      bundle.datasets.map((d: Record<string, unknown>) =>
        JSON.stringify([d.name, d.quantity, d.rUnit, d.valueUnit, d.r, d.values]),
      ),
    );
    expect(distinct.size).toBeLessThan(held);
    expect(first.body.datasets).toBe(distinct.size);
    const target = first.body.projectId;

    const source = (await editor.get(`/api/projects/${dataProject}/figures`)).body.find(
      (f: { title: string }) => f.title === 'R of 1s with data',
    );
    const copy = (await editor.get(`/api/projects/${target}/figures`)).body.find(
      (f: { title: string }) => f.title === 'R of 1s with data',
    );
    const copySpec = (await editor.get(`/api/figures/${copy.id}`)).body.spec;
    const drawn = datasetSchema.parse(
      (await editor.get(`/api/datasets/${copySpec.kind.datasets[0].id}`)).body,
    );
    expect(drawn.projectId).toBe(target);
    const original = (await editor.get(`/api/figures/${source.id}`)).body.spec.kind.datasets[0].id;
    const originalData = datasetSchema.parse((await editor.get(`/api/datasets/${original}`)).body);
    expect([drawn.name, drawn.r, drawn.values]).toEqual([
      originalData.name,
      originalData.r,
      originalData.values,
    ]);
    const svgA = await editor.getBytes(`/api/figures/${source.id}/render?format=svg`);
    const svgB = await editor.getBytes(`/api/figures/${copy.id}/render?format=svg`);
    expect(svgB.bytes.equals(svgA.bytes)).toBe(true);

    const before = await datasetRows();
    const again = await editor.upload(`/api/projects/${target}/import`, {
      field: 'bundle',
      name: 'b.json',
      content: bytes,
    });
    expect(again.status).toBe(200);
    expect(again.body.datasets).toBe(0);
    expect(await datasetRows()).toBe(before);
  });
});
