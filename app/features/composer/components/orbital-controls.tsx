// The system (Z, nucleus, length unit) and the state: one orbital picked by n, l and its name, or a
// superposition of terms with complex weights and a time. Every list offers only valid values.
import { SegmentedChoice } from '../../../components/ui/segmented-choice';
import { Button } from '../../../components/ui/button';
import { angularMomentumLetter, orbitalLabel } from '../../../../shared/physics/orbital-labels';
import { MAX_N, MAX_Z, type FigureSpec, type SpecTerm } from '../../../../shared/spec/figure-spec';
import {
  addTerm,
  isSuperposition,
  makeSingle,
  MAX_TERMS,
  orbitalChoices,
  range,
  removeTerm,
  setBasis,
  setQuantumNumber,
  setTime,
  setWeight,
  type Basis,
} from '../utils/spec-edits';
import { orbitalPlainText } from '../utils/orbital-text';
import type { EditSpec } from '../utils/spec-history';
import { ChoiceField } from './choice-field';
import { ControlGroup } from './control-group';
import { NumberField } from './number-field';
import { OrbitalName } from './orbital-name';

type Nucleus = 'infinite' | 'H-1' | 'H-2' | 'He-4';
const NUCLEI: { value: Nucleus; label: string }[] = [
  { value: 'infinite', label: 'Fixed (infinite mass)' },
  { value: 'H-1', label: '¹H (reduced mass)' },
  { value: 'H-2', label: '²H (reduced mass)' },
  { value: 'He-4', label: '⁴He⁺ (reduced mass)' },
];
const UNITS = [
  { value: 'bohr', label: 'bohr (a₀)' },
  { value: 'pm', label: 'picometres (pm)' },
  { value: 'angstrom', label: 'ångström (Å)' },
] as const;
const BASES: { value: Basis; label: string }[] = [
  { value: 'real', label: 'Real (named orbitals)' },
  { value: 'complex', label: 'Complex (m = −l … +l)' },
];

interface Props {
  spec: FigureSpec;
  onEdit: EditSpec;
  readOnly: boolean;
}

function TermControls({
  spec,
  index,
  onEdit,
  readOnly,
  prefix,
}: Props & { index: number; prefix: string | undefined }) {
  const t: SpecTerm = spec.state.terms[index];
  const field = (name: string) => `state.terms.${index}.${name}`;
  return (
    <div className="grid grid-cols-2 gap-3">
      <ChoiceField
        srPrefix={prefix}
        label="n (shell)"
        value={t.n}
        disabled={readOnly}
        choices={range(1, MAX_N).map((n) => ({ value: n, label: String(n) }))}
        onChange={(n) => onEdit(setQuantumNumber(spec, index, 'n', n), field('n'))}
      />
      <ChoiceField
        srPrefix={prefix}
        label="l (subshell)"
        value={t.l}
        disabled={readOnly}
        choices={range(0, t.n - 1).map((l) => ({
          value: l,
          label: `${l} (${angularMomentumLetter(l)})`,
        }))}
        onChange={(l) => onEdit(setQuantumNumber(spec, index, 'l', l), field('l'))}
      />
      <ChoiceField
        srPrefix={prefix}
        label="Orbital"
        className="col-span-2"
        value={t.m}
        disabled={readOnly}
        hint={
          t.basis === 'real' ? 'Real orbitals by name; m as in the cos/sin convention.' : undefined
        }
        choices={orbitalChoices(t.l, t.basis).map((c) => ({
          value: c.m,
          label: `${t.n}${orbitalPlainText(c.label)}${t.basis === 'real' && t.l > 0 && t.l <= 3 ? ` (m = ${c.m > 0 ? '+' : ''}${c.m})` : ''}`,
        }))}
        onChange={(m) => onEdit(setQuantumNumber(spec, index, 'm', m), field('m'))}
      />
      <ChoiceField
        srPrefix={prefix}
        label="Basis"
        className="col-span-2"
        value={t.basis}
        disabled={readOnly}
        choices={BASES}
        onChange={(b) => onEdit(setBasis(spec, index, b), field('basis'))}
      />
    </div>
  );
}

export function OrbitalControls({ spec, onEdit, readOnly }: Props) {
  const nucleus = typeof spec.system.nucleus === 'string' ? spec.system.nucleus : null;
  const superposed = isSuperposition(spec);
  return (
    <div className="space-y-4">
      <ControlGroup legend="Atom">
        <div className="grid grid-cols-2 gap-3">
          <NumberField
            label="Nuclear charge Z"
            value={spec.system.Z}
            min={1}
            max={MAX_Z}
            integer
            disabled={readOnly}
            hint={spec.system.Z === 1 ? 'Hydrogen' : `One electron, Z = ${spec.system.Z}`}
            onChange={(Z) => onEdit({ ...spec, system: { ...spec.system, Z } }, 'system.Z')}
          />
          <ChoiceField
            label="Length unit"
            value={spec.system.lengthUnit}
            disabled={readOnly}
            choices={UNITS}
            onChange={(lengthUnit) =>
              onEdit({ ...spec, system: { ...spec.system, lengthUnit } }, 'system.lengthUnit')
            }
          />
          {nucleus ? (
            <ChoiceField
              label="Nucleus"
              className="col-span-2"
              value={nucleus}
              disabled={readOnly}
              choices={NUCLEI}
              onChange={(n) =>
                onEdit({ ...spec, system: { ...spec.system, nucleus: n } }, 'system.nucleus')
              }
            />
          ) : (
            <p className="col-span-2 text-sm text-stone-700">
              Nucleus of mass{' '}
              {String(
                typeof spec.system.nucleus === 'object' && spec.system.nucleus.massInElectronMasses,
              )}{' '}
              electron masses (set outside the composer).
            </p>
          )}
        </div>
      </ControlGroup>

      <ControlGroup legend="State">
        {readOnly ? null : (
          <SegmentedChoice
            legend="Kind of state"
            value={superposed ? 'superposition' : 'single'}
            options={[
              { value: 'single', label: 'One orbital' },
              { value: 'superposition', label: 'Superposition' },
            ]}
            onChange={(v) =>
              onEdit(v === 'single' ? makeSingle(spec) : addTerm(spec), 'state.mode')
            }
          />
        )}
        {superposed ? (
          <>
            <ol className="space-y-3" aria-label="Terms of the superposition">
              {spec.state.terms.map((t, i) => (
                <li key={i} className="space-y-2 rounded-md border border-stone-200 p-2.5">
                  <div className="flex items-center justify-between">
                    <p className="text-sm font-semibold text-stone-800">
                      Term {i + 1}: <OrbitalName label={orbitalLabel(t.n, t.l, t.m, t.basis)} />
                    </p>
                    {readOnly ? null : (
                      <Button
                        size="sm"
                        variant="quiet"
                        aria-label={`Remove term ${i + 1}`}
                        onClick={() => onEdit(removeTerm(spec, i), 'state.terms')}
                      >
                        Remove
                      </Button>
                    )}
                  </div>
                  <TermControls
                    spec={spec}
                    index={i}
                    onEdit={onEdit}
                    readOnly={readOnly}
                    prefix={`Term ${i + 1}`}
                  />
                  <div className="grid grid-cols-2 gap-3">
                    <NumberField
                      srPrefix={`Term ${i + 1}`}
                      label="Weight, real part"
                      value={t.weight.re}
                      min={-100}
                      max={100}
                      step={0.1}
                      disabled={readOnly}
                      onChange={(v) =>
                        onEdit(setWeight(spec, i, 're', v), `state.terms.${i}.weight.re`)
                      }
                    />
                    <NumberField
                      srPrefix={`Term ${i + 1}`}
                      label="Weight, imaginary"
                      value={t.weight.im}
                      min={-100}
                      max={100}
                      step={0.1}
                      disabled={readOnly}
                      onChange={(v) =>
                        onEdit(setWeight(spec, i, 'im', v), `state.terms.${i}.weight.im`)
                      }
                    />
                  </div>
                </li>
              ))}
            </ol>
            <p className="text-xs text-stone-600">
              Weights are normalised when the figure is drawn.
            </p>
            {readOnly || spec.state.terms.length >= MAX_TERMS ? null : (
              <Button size="sm" onClick={() => onEdit(addTerm(spec), 'state.terms')}>
                Add a term
              </Button>
            )}
            <NumberField
              label="Time"
              unit="ħ/Eₕ"
              value={spec.state.time}
              min={0}
              max={1e6}
              step={0.5}
              disabled={readOnly}
              hint="Each term turns as e^(−iEt); at t = 0 the weights are as given."
              onChange={(v) => onEdit(setTime(spec, v), 'state.time')}
            />
          </>
        ) : (
          <TermControls
            spec={spec}
            index={0}
            onEdit={onEdit}
            readOnly={readOnly}
            prefix={undefined}
          />
        )}
      </ControlGroup>
    </div>
  );
}
