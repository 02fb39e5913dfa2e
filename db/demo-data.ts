// Demo data: an invented scenario. "Atoms & Bonds" is a general-chemistry textbook of the fictional
// Harrowgate University Press; CHEM 1020 is a lecture course at the fictional Fennwick College.
// Every person, institution and book here is fictional.
import type { Knex } from 'knex';
import type { ProjectRole } from '../shared/api/roles';
import type { User } from '../shared/api/schemas';
import { figureSpecSchema, type FigureSpecInput } from '../shared/spec/figure-spec';
import { hashPassword } from '../api/auth/passwords';
import { insertProject } from '../api/repositories/projects';
import { insertUser, toUser } from '../api/repositories/users';
import { createFigure, updateFigure } from '../api/services/figures';

export const demoSignIns = {
  password: 'lobewright-demo',
  users: [
    { email: 'ada.okafor@harrowgate.example', name: 'Ada Okafor', what: 'author; owner of both projects' },
    { email: 'ravi.mendes@harrowgate.example', name: 'Ravi Mendes', what: 'co-author; editor' },
    { email: 'lena.brandt@fennwick.example', name: 'Lena Brandt', what: 'reviewer' },
    { email: 'tomas.reyes@fennwick.example', name: 'Tomás Reyes', what: 'viewer' },
    { email: 'admin@lobewright.example', name: 'Morgan Hale', what: 'site admin (no project role)' },
  ],
};

const roles: Record<string, ProjectRole> = {
  'ada.okafor@harrowgate.example': 'owner',
  'ravi.mendes@harrowgate.example': 'editor',
  'lena.brandt@fennwick.example': 'reviewer',
  'tomas.reyes@fennwick.example': 'viewer',
};

type Status = 'draft' | 'in_review' | 'changes_requested' | 'approved';
interface DemoFigure {
  number: string;
  title: string;
  caption: string;
  status: Status;
  spec: Omit<FigureSpecInput, 'schemaVersion'>;
  /** A second revision, to give the figure some history. */
  revise?: { message: string; spec: Omit<FigureSpecInput, 'schemaVersion'> };
}

const one = (n: number, l: number, m: number) => ({ terms: [{ n, l, m }] });

const chapter4: DemoFigure[] = [
  {
    number: '4.1',
    title: 'The 1s orbital',
    caption: 'Surface enclosing 90 % of the probability of the hydrogen 1s orbital.',
    status: 'approved',
    spec: { state: one(1, 0, 0), kind: { type: 'isosurface', enclosed: 0.9 } },
  },
  {
    number: '4.2',
    title: 'Radial distributions of 1s, 2s and 3s',
    caption: 'Radial probability density r²R² for the first three s orbitals; nodes marked.',
    status: 'approved',
    spec: {
      state: one(3, 0, 0),
      kind: {
        type: 'radial',
        curves: [
          { n: 1, l: 0, quantity: 'r2R2' },
          { n: 2, l: 0, quantity: 'r2R2' },
          { n: 3, l: 0, quantity: 'r2R2' },
        ],
      },
      print: { widthMm: 174, heightMm: 70 },
    },
  },
  {
    number: '4.3',
    title: 'The 2p_z orbital',
    caption: 'The 2p_z orbital: two lobes of opposite phase separated by the xy nodal plane.',
    status: 'in_review',
    spec: { state: one(2, 1, 0), kind: { type: 'isosurface', enclosed: 0.9 }, look: { showNodalSurfaces: true } },
    revise: {
      message: 'View from the side',
      spec: {
        state: one(2, 1, 0),
        kind: { type: 'isosurface', enclosed: 0.9 },
        view: { azimuthDeg: 0, elevationDeg: 0 },
        look: { showNodalSurfaces: true },
      },
    },
  },
  {
    number: '4.4',
    title: 'The 3d_z² orbital',
    caption: 'The 3d_z² orbital with its two nodal cones.',
    status: 'changes_requested',
    spec: { state: one(3, 2, 0), kind: { type: 'isosurface', enclosed: 0.9 } },
  },
  {
    number: '4.5',
    title: 'Slice through the 3p_z orbital',
    caption: 'Signed wavefunction of 3p_z in the xz-plane, with contours enclosing 50 % and 90 %.',
    status: 'draft',
    spec: { state: one(3, 1, 0), kind: { type: 'slice', plane: 'xz', quantity: 'psi' } },
  },
  {
    number: '4.6',
    title: 'Effective potential for l = 0, 1, 2',
    caption: 'Coulomb attraction plus the centrifugal term l(l+1)/(2r²) for s, p and d electrons.',
    status: 'draft',
    spec: {
      state: one(3, 2, 0),
      kind: {
        type: 'radial',
        curves: [
          { n: 3, l: 0, quantity: 'veff' },
          { n: 3, l: 1, quantity: 'veff' },
          { n: 3, l: 2, quantity: 'veff' },
        ],
        rMax: 30,
      },
    },
  },
  {
    number: '4.7',
    title: 'Energy levels and the Balmer series',
    caption: 'Hydrogen energy levels with the first four Balmer transitions and their wavelengths.',
    status: 'in_review',
    spec: {
      state: one(1, 0, 0),
      kind: {
        type: 'levels',
        nMax: 6,
        transitions: [
          { upper: 3, lower: 2 },
          { upper: 4, lower: 2 },
          { upper: 5, lower: 2 },
          { upper: 6, lower: 2 },
        ],
      },
    },
  },
  {
    number: '4.8',
    title: 'The 4f_xyz orbital',
    caption: 'One of the seven 4f orbitals: eight lobes between the coordinate planes.',
    status: 'draft',
    spec: { state: one(4, 3, -2), kind: { type: 'isosurface', enclosed: 0.9, grid: 128 } },
  },
];

const chem1020: DemoFigure[] = [
  {
    number: 'L3.1',
    title: '2s probability cloud',
    caption: 'Twenty thousand positions sampled from the 2s probability density.',
    status: 'approved',
    spec: { state: one(2, 0, 0), kind: { type: 'cloud', points: 20000 } },
  },
  {
    number: 'L3.2',
    title: 'An sp³ hybrid',
    caption: 'One sp³ hybrid, (2s + 2p_x + 2p_y + 2p_z)/2, on a single hydrogen-like centre.',
    status: 'in_review',
    spec: {
      state: {
        terms: [
          { n: 2, l: 0, m: 0 },
          { n: 2, l: 1, m: 1 },
          { n: 2, l: 1, m: -1 },
          { n: 2, l: 1, m: 0 },
        ],
      },
      kind: { type: 'isosurface', enclosed: 0.9 },
    },
  },
  {
    number: 'L3.3',
    title: 'Angular shape of d_z²',
    caption: 'The real spherical harmonic Y(2,0) as a polar surface.',
    status: 'draft',
    spec: { state: one(3, 2, 0), kind: { type: 'angular', mode: 'surface', quantity: 'real' } },
  },
  {
    number: 'L3.4',
    title: '1s + 2p_z superposition',
    caption: 'Density of an equal superposition of 1s and 2p_z at t = 0.',
    status: 'draft',
    spec: {
      state: {
        terms: [
          { n: 1, l: 0, m: 0 },
          { n: 2, l: 1, m: 0 },
        ],
      },
      kind: { type: 'slice', plane: 'xz', quantity: 'density' },
    },
  },
];

async function addFigures(db: Knex, projectId: number, author: User, reviser: User, figures: DemoFigure[]) {
  for (const f of figures) {
    const spec = figureSpecSchema.parse({ schemaVersion: 1, ...f.spec });
    let fig = await createFigure(db, author, projectId, {
      number: f.number,
      title: f.title,
      caption: f.caption,
      altText: '',
      spec,
    });
    if (f.revise) {
      fig = await updateFigure(db, reviser, fig.id, {
        baseRevision: fig.revision,
        spec: figureSpecSchema.parse({ schemaVersion: 1, ...f.revise.spec }),
        message: f.revise.message,
      });
    }
    await db('figures')
      .where({ id: fig.id })
      .update({ status: f.status, approved_revision: f.status === 'approved' ? fig.revision : null });
  }
}

export async function loadDemoData(db: Knex, bcryptCost: number): Promise<void> {
  const hash = await hashPassword(demoSignIns.password, bcryptCost);
  const users: Record<string, User> = {};
  for (const u of demoSignIns.users) {
    const row = await insertUser(db, {
      email: u.email,
      name: u.name,
      passwordHash: hash,
      isAdmin: u.email.startsWith('admin@'),
    });
    users[u.email] = toUser(row);
  }
  const ada = users['ada.okafor@harrowgate.example'];
  const ravi = users['ravi.mendes@harrowgate.example'];
  const projects: [string, string, DemoFigure[]][] = [
    [
      'Atoms & Bonds — Chapter 4: The Hydrogen Atom',
      'Figures for Chapter 4 of "Atoms & Bonds", 3rd edition (Harrowgate University Press).',
      chapter4,
    ],
    [
      'CHEM 1020 — Fennwick College lectures',
      'Slides and handouts for lecture 3 of CHEM 1020, General Chemistry II, at Fennwick College.',
      chem1020,
    ],
  ];
  for (const [name, description, figures] of projects) {
    const projectId = await db.transaction((trx) => insertProject(trx, { name, description, ownerId: ada.id }));
    for (const [email, role] of Object.entries(roles)) {
      if (role === 'owner') continue;
      await db('memberships').insert({ project_id: projectId, user_id: users[email].id, role });
    }
    await addFigures(db, projectId, ada, ravi, figures);
  }
}
