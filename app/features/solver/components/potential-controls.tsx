// Picks a central potential for the radial solver: its type, its parameters with units and limits
// (a tabulated one as CSV text), and a read-out of the lowest levels of each l with their estimated
// error, node count and ⟨r⟩, solved when the browser is idle. Only values the spec schema accepts
// reach onChange; the solver's refusal (a level that is not bound) is shown as it says it.
import { useId, useState } from 'react';
import { potentialSpecSchema, type PotentialSpec } from '../../../../shared/spec/figure-spec';
import { cn } from '../../../utils/cn';
import { useDeferredReadout } from '../hooks/use-deferred-readout';
import {
  parameterValue,
  POTENTIAL_TYPE_INFO,
  POTENTIAL_TYPES,
  type ParameterInfo,
  type PotentialType,
} from '../utils/potential-parameters';

export interface PotentialControlsProps {
  value: PotentialSpec;
  onChange: (value: PotentialSpec) => void;
  /** Angular momenta and levels per l of the read-out. */
  ls?: number[];
  levels?: number;
  /** Reduced mass μ/m_e of the figure's nucleus. */
  muRatio?: number;
  disabled?: boolean;
}

/** The first problem zod finds, as "lambda (bohr⁻¹) must not be negative". */
function check(next: unknown): { spec: PotentialSpec } | { problem: string } {
  const parsed = potentialSpecSchema.safeParse(next);
  if (parsed.success) return { spec: parsed.data };
  const issue = parsed.error.issues[0];
  return {
    problem: issue.path.length ? `${issue.path.join('.')}: ${issue.message}` : issue.message,
  };
}

function ParameterField({
  info,
  spec,
  onChange,
  disabled,
}: {
  info: ParameterInfo;
  spec: PotentialSpec;
  onChange: (value: PotentialSpec) => void;
  disabled?: boolean;
}) {
  const id = useId();
  const value = parameterValue(spec, info.key);
  const [draft, setDraft] = useState<{ text: string; over: number; problem: string | null } | null>(
    null,
  );
  const shown = draft && draft.over === value ? draft : null;
  return (
    <div className="space-y-1">
      <label htmlFor={id} className="block text-sm font-semibold text-stone-800">
        {info.label}
      </label>
      <div className="flex items-center gap-2">
        <input
          id={id}
          type="number"
          inputMode={info.integer ? 'numeric' : 'decimal'}
          min={info.min}
          max={info.max}
          step={info.step}
          value={shown ? shown.text : String(value)}
          disabled={disabled}
          aria-invalid={shown?.problem ? true : undefined}
          aria-describedby={shown?.problem ? `${id}-error` : `${id}-limits`}
          onChange={(e) => {
            const text = e.target.value;
            const v = Number(text.replace(',', '.'));
            let problem: string | null = null;
            if (text.trim() === '' || !Number.isFinite(v)) problem = 'enter a number';
            else if (v < info.min || v > info.max) problem = `enter ${info.min} to ${info.max}`;
            else if (info.integer && !Number.isInteger(v)) problem = 'enter a whole number';
            if (!problem) {
              const next: Record<string, unknown> = { ...spec, [info.key]: v };
              // A tail charge of 0 means no tail: the key is left out.
              if (info.key === 'asymptoticCharge' && v === 0) delete next.asymptoticCharge;
              const checked = check(next);
              if ('spec' in checked) {
                setDraft({ text, over: v, problem: null });
                if (v !== value) onChange(checked.spec);
                return;
              }
              problem = checked.problem;
            }
            setDraft({ text, over: value, problem });
          }}
          onBlur={() => setDraft(null)}
          className={cn(
            'block w-full min-w-0 rounded-md border bg-white px-2.5 py-1.5 text-sm tabular-nums text-stone-900 shadow-xs',
            'disabled:bg-stone-100 disabled:text-stone-600',
            shown?.problem ? 'border-red-600' : 'border-stone-300',
          )}
        />
        {info.unit ? <span className="shrink-0 text-sm text-stone-600">{info.unit}</span> : null}
      </div>
      {shown?.problem ? (
        <p id={`${id}-error`} className="text-xs text-red-700">
          {info.label}: {shown.problem}; the potential keeps {value}.
        </p>
      ) : (
        <p id={`${id}-limits`} className="text-xs text-stone-600">
          {info.min} to {info.max}
          {info.unit ? ` ${info.unit}` : ''}
        </p>
      )}
    </div>
  );
}

function CsvField({
  spec,
  onChange,
  disabled,
}: {
  spec: Extract<PotentialSpec, { type: 'tabulated' }>;
  onChange: (value: PotentialSpec) => void;
  disabled?: boolean;
}) {
  const id = useId();
  const [draft, setDraft] = useState<{ text: string; problem: string | null } | null>(null);
  const take = (text: string) => {
    const checked = check({ ...spec, csv: text });
    if ('spec' in checked) onChange(checked.spec);
    setDraft({ text, problem: 'problem' in checked ? checked.problem : null });
  };
  return (
    <div className="space-y-1">
      <label className="block text-sm font-semibold text-stone-800">
        Upload a table (CSV file)
        <input
          type="file"
          accept=".csv,text/csv,text/plain"
          disabled={disabled}
          className="mt-1 block text-xs font-normal"
          onChange={(e) => {
            const file = e.target.files?.[0];
            if (file) void file.text().then(take);
          }}
        />
      </label>
      <label htmlFor={id} className="block text-sm font-semibold text-stone-800">
        Table (CSV: header r_bohr|r_angstrom|r_pm, V_hartree|V_eV)
      </label>
      <textarea
        id={id}
        rows={6}
        value={draft?.text ?? spec.csv}
        disabled={disabled}
        spellCheck={false}
        aria-invalid={draft?.problem ? true : undefined}
        aria-describedby={draft?.problem ? `${id}-error` : undefined}
        onChange={(e) => take(e.target.value)}
        className="block w-full rounded-md border border-stone-300 bg-white px-2.5 py-1.5 font-mono text-xs text-stone-900"
      />
      {draft?.problem ? (
        <p id={`${id}-error`} className="text-xs text-red-700">
          {draft.problem}
        </p>
      ) : null}
    </div>
  );
}

const formatEnergy = (v: number): string => v.toPrecision(8).replace('-', '−');
const formatError = (v: number): string =>
  v === 0 ? '< 1e-16' : v.toExponential(1).replace('-', '−');

export function PotentialControls({
  value,
  onChange,
  ls = [0, 1, 2],
  levels = 2,
  muRatio = 1,
  disabled,
}: PotentialControlsProps) {
  const typeId = useId();
  const info = POTENTIAL_TYPE_INFO[value.type];
  const { readout, pending } = useDeferredReadout(value, ls, levels, muRatio);
  return (
    <div className="space-y-3">
      <div className="space-y-1">
        <label htmlFor={typeId} className="block text-sm font-semibold text-stone-800">
          Potential
        </label>
        <select
          id={typeId}
          value={value.type}
          disabled={disabled}
          aria-describedby={`${typeId}-formula`}
          onChange={(e) => onChange(POTENTIAL_TYPE_INFO[e.target.value as PotentialType].initial)}
          className="block w-full rounded-md border border-stone-300 bg-white px-2.5 py-1.5 text-sm text-stone-900 shadow-xs disabled:bg-stone-100"
        >
          {POTENTIAL_TYPES.map((t) => (
            <option key={t} value={t}>
              {POTENTIAL_TYPE_INFO[t].name}
            </option>
          ))}
        </select>
        <p id={`${typeId}-formula`} className="text-xs text-stone-600">
          {info.formula} (V in hartree, r in bohr)
        </p>
      </div>
      <div className="grid grid-cols-2 gap-3">
        {info.parameters.map((p) => (
          <ParameterField
            key={`${value.type}-${p.key}`}
            info={p}
            spec={value}
            onChange={onChange}
            disabled={disabled}
          />
        ))}
      </div>
      {value.type === 'tabulated' ? (
        <CsvField spec={value} onChange={onChange} disabled={disabled} />
      ) : null}
      {readout === null || pending ? (
        <p role="status" className="text-sm text-stone-600">
          Solving…
        </p>
      ) : null}
      {readout && readout.refusals.length > 0 ? (
        <ul role="alert" className="space-y-1 text-sm text-red-700">
          {readout.refusals.map((r) => (
            <li key={r.field}>
              The solver refuses ({r.field}): {r.message}
            </li>
          ))}
        </ul>
      ) : null}
      {readout && readout.rows.length > 0 ? (
        <table className={cn('w-full text-left text-xs tabular-nums', pending && 'opacity-60')}>
          <caption className="pb-1 text-left text-sm font-semibold text-stone-800">
            Lowest levels (solved numerically)
          </caption>
          <thead>
            <tr className="text-stone-600">
              <th scope="col">Level</th>
              <th scope="col">Energy / hartree</th>
              <th scope="col">Est. error / hartree</th>
              <th scope="col">Radial nodes</th>
              <th scope="col">⟨r⟩ / bohr</th>
            </tr>
          </thead>
          <tbody>
            {readout.rows.map((row) => (
              <tr key={row.name}>
                <th scope="row" className="font-normal">
                  {row.name}
                </th>
                <td>{formatEnergy(row.energy)}</td>
                <td>{formatError(row.error)}</td>
                <td>{row.nodes}</td>
                <td>{row.rMean.toPrecision(5)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      ) : null}
    </div>
  );
}
