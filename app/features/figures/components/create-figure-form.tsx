// The "new figure" form: title and number, a kind, and one orbital picked by n, l and m. The
// pickers only offer valid states (0 ≤ l < n, |m| ≤ l), and the spec they make is parsed by the
// shared figure-spec schema before it is sent.
import { useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { SelectField, TextField } from '../../../components/ui/form-field';
import { FormAlert } from '../../../components/ui/status';
import { useValidatedSubmit } from '../../../hooks/use-validated-submit';
import { formErrorMessage } from '../../../lib/form-errors';
import { createFigureBody, type Figure } from '../../../../shared/api/schemas';
import { figureKindNames } from '../../../../shared/spec/figure-spec';
import { cn } from '../../../utils/cn';
import { useCreateFigure } from '../api/create-figure';
import { figureKindInfo, type FigureKindName } from '../utils/figure-kinds';
import { angularMomentumLetter, angularSubscript } from '../../../../shared/physics/orbital-labels';
import { signedNumber } from '../utils/signed-number';
import {
  buildQuickSpec,
  clampQuickState,
  lChoices,
  mChoices,
  nChoices,
  type QuickState,
} from '../utils/quick-spec';
import { OrbitalLabel } from './orbital-label';

const FIELDS = ['title', 'number'] as const;

function KindPicker({
  value,
  onChange,
}: {
  value: FigureKindName;
  onChange: (kind: FigureKindName) => void;
}) {
  return (
    <fieldset>
      <legend className="mb-2 text-sm font-semibold text-stone-800">Kind of figure</legend>
      <div className="grid gap-2 sm:grid-cols-2">
        {figureKindNames.map((kind) => (
          <label
            key={kind}
            className={cn(
              'flex cursor-pointer gap-3 rounded-lg border p-3 text-sm has-[:focus-visible]:outline-2 has-[:focus-visible]:outline-offset-2 has-[:focus-visible]:outline-accent-600',
              kind === value
                ? 'border-accent-600 bg-accent-50'
                : 'border-stone-200 hover:border-stone-400',
            )}
          >
            <input
              type="radio"
              name="kind"
              value={kind}
              checked={kind === value}
              onChange={() => onChange(kind)}
              className="mt-0.5 accent-accent-600"
            />
            <span>
              <span className="block font-semibold text-stone-900">
                {figureKindInfo[kind].name}
              </span>
              <span className="block text-stone-600">{figureKindInfo[kind].description}</span>
            </span>
          </label>
        ))}
      </div>
    </fieldset>
  );
}

/** "−2 (f_xyz)" for the named real orbitals, plain "+5" beyond f. */
function mOptionLabel(l: number, m: number): string {
  const subscript = l <= 3 ? angularSubscript(l, m, 'real') : null;
  const value = signedNumber(m, { plus: true });
  return subscript ? `${value}  (${angularMomentumLetter(l)}_${subscript})` : value;
}

function StatePicker({
  state,
  onChange,
}: {
  state: QuickState;
  onChange: (state: QuickState) => void;
}) {
  const set = (key: keyof QuickState) => (e: { target: { value: string } }) =>
    onChange(clampQuickState({ ...state, [key]: Number(e.target.value) }));
  return (
    <fieldset>
      <legend className="mb-2 text-sm font-semibold text-stone-800">
        Orbital: <OrbitalLabel n={state.n} l={state.l} m={state.m} />
      </legend>
      <div className="grid grid-cols-3 gap-3">
        <SelectField label="n (shell)" value={state.n} onChange={set('n')}>
          {nChoices().map((n) => (
            <option key={n} value={n}>
              {n}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="l (subshell)"
          value={state.l}
          onChange={set('l')}
          hint={`0 to ${state.n - 1}`}
        >
          {lChoices(state.n).map((l) => (
            <option key={l} value={l}>
              {l} ({angularMomentumLetter(l)})
            </option>
          ))}
        </SelectField>
        <SelectField
          label="m"
          value={state.m}
          onChange={set('m')}
          hint={state.l === 0 ? 'only 0 for s' : `−${state.l} to +${state.l}`}
        >
          {mChoices(state.l).map((m) => (
            <option key={m} value={m}>
              {mOptionLabel(state.l, m)}
            </option>
          ))}
        </SelectField>
      </div>
    </fieldset>
  );
}

interface CreateFigureFormProps {
  projectId: number;
  onCreated: (figure: Figure) => void;
  onCancel: () => void;
}

export function CreateFigureForm({ projectId, onCreated, onCancel }: CreateFigureFormProps) {
  const createFigure = useCreateFigure(projectId);
  const [title, setTitle] = useState('');
  const [number, setNumber] = useState('');
  const [kind, setKind] = useState<FigureKindName>('isosurface');
  const [state, setState] = useState<QuickState>({ n: 2, l: 1, m: 0 });
  const { errors, submit } = useValidatedSubmit(createFigureBody, createFigure);

  function onSubmit(event: FormEvent) {
    event.preventDefault();
    // A blank number is left out: the schema only accepts a number that is there.
    submit(
      { title, number: number.trim() || undefined, spec: buildQuickSpec(kind, state) },
      onCreated,
    );
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-5">
      <FormAlert message={formErrorMessage(createFigure.error, FIELDS)} />
      <div className="grid gap-4 sm:grid-cols-[8rem_1fr]">
        <TextField
          label="Number"
          name="number"
          value={number}
          onChange={(e) => setNumber(e.target.value)}
          error={errors.number}
          hint="e.g. 4.2a"
        />
        <TextField
          label="Title"
          name="title"
          required
          value={title}
          onChange={(e) => setTitle(e.target.value)}
          error={errors.title}
        />
      </div>
      <KindPicker value={kind} onChange={setKind} />
      <StatePicker state={state} onChange={setState} />
      <div className="flex justify-end gap-2">
        <Button onClick={onCancel}>Cancel</Button>
        <Button type="submit" variant="primary" busy={createFigure.isPending}>
          {createFigure.isPending ? 'Creating…' : 'Create figure'}
        </Button>
      </div>
    </form>
  );
}
