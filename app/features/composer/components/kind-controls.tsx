// The kind of figure and its own settings: isosurface, slice, radial plot, cloud, angular shape or
// energy levels. Every control offers only values the spec schema accepts.
import { Button } from '../../../components/ui/button';
import { CheckboxField } from '../../../components/ui/checkbox-field';
import { angularMomentumLetter } from '../../../../shared/physics/orbital-labels';
import { systemMassRatio } from '../../../../shared/figures/figure-system';
import {
  DEFAULT_POTENTIAL,
  figureKindNames,
  MAX_N,
  MAX_POTENTIAL_L,
  MAX_POTENTIAL_LS,
  MAX_SOLVED_LEVELS,
  type FigureSpec,
} from '../../../../shared/spec/figure-spec';
import { PotentialControls } from '../../solver/components/potential-controls';
import {
  addRadialCurve,
  addTransition,
  changeKind,
  MAX_RADIAL_CURVES,
  MAX_TRANSITION_UPPER,
  MAX_TRANSITIONS,
  patchKind,
  range,
  removeRadialCurve,
  removeTransition,
  setRadialCurve,
  setTransition,
  type KindOf,
  type KindType,
  type RadialCurve,
} from '../utils/spec-edits';
import type { EditSpec } from '../utils/spec-history';
import { automaticExtent } from '../utils/automatic-extent';
import { ChoiceField } from './choice-field';
import { ControlGroup } from './control-group';
import { ListField } from './list-field';
import { NumberField } from './number-field';

export const KIND_NAMES: Record<KindType, string> = {
  isosurface: '3D isosurface',
  slice: '2D slice',
  radial: 'Radial plot',
  cloud: 'Probability cloud',
  angular: 'Angular shape',
  levels: 'Energy levels',
  potential: 'Effective potential',
};

const PLANES = [
  { value: 'xy', label: 'xy-plane' },
  { value: 'xz', label: 'xz-plane' },
  { value: 'yz', label: 'yz-plane' },
] as const;
const QUANTITIES: { value: RadialCurve['quantity']; label: string }[] = [
  { value: 'R', label: 'R(r)' },
  { value: 'r2R2', label: 'r²R² (distribution)' },
  { value: 'cumulative', label: 'Cumulative P(r)' },
  { value: 'veff', label: 'V_eff(r)' },
];

interface Props {
  spec: FigureSpec;
  onEdit: EditSpec;
  readOnly: boolean;
}

const pct = (f: number) => String(Number((f * 100).toFixed(1)));
const percentToFraction = (v: number): number | string =>
  v > 0 && v < 100 ? v / 100 : 'each percentage must lie between 0 and 100';

function PlaneField({
  plane,
  onChange,
  disabled,
}: {
  plane: KindOf<'slice'>['plane'];
  onChange: (p: 'xy' | 'xz' | 'yz') => void;
  disabled: boolean;
}) {
  if (typeof plane !== 'string')
    return (
      <p className="text-sm text-stone-700">Plane: a custom normal (set outside the composer).</p>
    );
  return (
    <ChoiceField
      label="Plane through the nucleus"
      value={plane}
      choices={PLANES}
      disabled={disabled}
      onChange={onChange}
    />
  );
}

/** A length in bohr the figure may fix, or leave to be chosen from the orbital (unset). */
function OptionalLength({
  checkLabel,
  label,
  value,
  start,
  max,
  autoNote,
  readOnly,
  onChange,
}: {
  checkLabel: string;
  label: string;
  value: number | undefined;
  start: number;
  max: number;
  autoNote: string;
  readOnly: boolean;
  onChange: (v: number | undefined) => void;
}) {
  return (
    <>
      <CheckboxField
        label={checkLabel}
        checked={value !== undefined}
        disabled={readOnly}
        onChange={(e) => onChange(e.target.checked ? start : undefined)}
      />
      {value !== undefined ? (
        <NumberField
          label={label}
          unit="bohr"
          value={value}
          min={0.1}
          max={max}
          step={1}
          disabled={readOnly}
          onChange={onChange}
        />
      ) : (
        <p className="text-xs text-stone-600">{autoNote}</p>
      )}
    </>
  );
}

/** The ✕ at the end of a list row (an empty cell keeps the grid when it cannot be removed). */
function RemoveRow({
  show,
  label,
  onClick,
}: {
  show: boolean;
  label: string;
  onClick: () => void;
}) {
  if (!show) return <span />;
  return (
    <Button size="sm" variant="quiet" aria-label={label} onClick={onClick}>
      ✕
    </Button>
  );
}

function AddRow({ show, label, onClick }: { show: boolean; label: string; onClick: () => void }) {
  return show ? (
    <Button size="sm" onClick={onClick}>
      {label}
    </Button>
  ) : null;
}

function KindSettings({ spec, onEdit, readOnly }: Props) {
  const k = spec.kind;
  const edit = (next: FigureSpec, name: string) => onEdit(next, `kind.${name}`);
  switch (k.type) {
    case 'isosurface':
      return (
        <>
          <NumberField
            label="Probability enclosed"
            unit="%"
            value={Number((k.enclosed * 100).toFixed(1))}
            min={5}
            max={99.9}
            step={1}
            disabled={readOnly}
            onChange={(v) => edit(patchKind(spec, 'isosurface', { enclosed: v / 100 }), 'enclosed')}
          />
          <NumberField
            label="Grid"
            unit="points per axis"
            value={k.grid}
            min={24}
            max={256}
            step={8}
            integer
            disabled={readOnly}
            hint="Finer grids give smoother surfaces and take longer."
            onChange={(v) => edit(patchKind(spec, 'isosurface', { grid: v }), 'grid')}
          />
          <OptionalLength
            checkLabel="Fixed box size"
            label="Box half-width"
            value={k.extent}
            start={automaticExtent(spec)}
            max={2000}
            autoNote="The box is sized to hold the orbital."
            readOnly={readOnly}
            onChange={(extent) => edit(patchKind(spec, 'isosurface', { extent }), 'extent')}
          />
          <CheckboxField
            label="Translucent outer surface"
            checked={k.outerSurface !== null}
            disabled={readOnly}
            onChange={(e) =>
              edit(
                patchKind(spec, 'isosurface', {
                  outerSurface: e.target.checked ? { enclosed: 0.99, opacity: 0.25 } : null,
                }),
                'outerSurface',
              )
            }
          />
          {k.outerSurface ? (
            <div className="grid grid-cols-2 gap-3">
              <NumberField
                label="Outer surface encloses"
                unit="%"
                value={Number((k.outerSurface.enclosed * 100).toFixed(1))}
                min={1}
                max={99.9}
                disabled={readOnly}
                onChange={(v) =>
                  edit(
                    patchKind(spec, 'isosurface', {
                      outerSurface: { ...k.outerSurface!, enclosed: v / 100 },
                    }),
                    'outer.enclosed',
                  )
                }
              />
              <NumberField
                label="Outer surface opacity"
                unit="%"
                value={Math.round(k.outerSurface.opacity * 100)}
                min={0}
                max={100}
                integer
                disabled={readOnly}
                onChange={(v) =>
                  edit(
                    patchKind(spec, 'isosurface', {
                      outerSurface: { ...k.outerSurface!, opacity: v / 100 },
                    }),
                    'outer.opacity',
                  )
                }
              />
            </div>
          ) : null}
        </>
      );
    case 'slice':
      return (
        <>
          <PlaneField
            plane={k.plane}
            disabled={readOnly}
            onChange={(plane) => edit(patchKind(spec, 'slice', { plane }), 'plane')}
          />
          <ChoiceField
            label="Quantity"
            value={k.quantity}
            disabled={readOnly}
            choices={[
              { value: 'psi', label: 'Signed wavefunction ψ' },
              { value: 'density', label: 'Probability density |ψ|²' },
            ]}
            onChange={(quantity) => edit(patchKind(spec, 'slice', { quantity }), 'quantity')}
          />
          <ChoiceField
            label="Contour lines"
            value={k.contours.mode}
            disabled={readOnly}
            choices={[
              { value: 'enclosed', label: 'By probability enclosed' },
              { value: 'levels', label: 'At fixed values' },
            ]}
            onChange={(mode) =>
              edit(
                patchKind(spec, 'slice', {
                  contours:
                    mode === 'enclosed' ? { mode, fractions: [0.5, 0.9] } : { mode, levels: [] },
                }),
                'contours.mode',
              )
            }
          />
          {k.contours.mode === 'enclosed' ? (
            <ListField
              label="Contours enclosing"
              unit="% of the probability"
              values={k.contours.fractions}
              show={pct}
              parse={percentToFraction}
              maxItems={12}
              disabled={readOnly}
              hint="Comma-separated, e.g. 50, 90."
              onChange={(fractions) =>
                edit(
                  patchKind(spec, 'slice', { contours: { mode: 'enclosed', fractions } }),
                  'contours',
                )
              }
            />
          ) : (
            <ListField
              label="Contour values"
              unit={k.quantity === 'psi' ? 'bohr⁻³ᐟ²' : 'bohr⁻³'}
              values={k.contours.levels}
              show={(v) => String(v)}
              parse={(v) => v}
              maxItems={24}
              disabled={readOnly}
              hint="Comma-separated; leave empty for none."
              onChange={(levels) =>
                edit(patchKind(spec, 'slice', { contours: { mode: 'levels', levels } }), 'contours')
              }
            />
          )}
          <NumberField
            label="Resolution"
            unit="px across"
            value={k.resolution}
            min={32}
            max={1024}
            step={32}
            integer
            disabled={readOnly}
            onChange={(resolution) => edit(patchKind(spec, 'slice', { resolution }), 'resolution')}
          />
          <OptionalLength
            checkLabel="Fixed plot size"
            label="Half-width of the plane shown"
            value={k.extent}
            start={automaticExtent(spec)}
            max={2000}
            autoNote="The plane shown is sized to hold the orbital."
            readOnly={readOnly}
            onChange={(extent) => edit(patchKind(spec, 'slice', { extent }), 'extent')}
          />
        </>
      );
    case 'radial':
      return (
        <>
          <ol className="space-y-2" aria-label="Curves">
            {k.curves.map((c, i) => (
              <li
                key={i}
                className="grid grid-cols-[4.5rem_5rem_minmax(0,1fr)_auto] items-end gap-2"
              >
                <ChoiceField
                  label={`Curve ${i + 1} n`}
                  value={c.n}
                  disabled={readOnly}
                  choices={range(1, MAX_N).map((n) => ({ value: n, label: String(n) }))}
                  onChange={(n) => edit(setRadialCurve(spec, i, { n }), `curves.${i}.n`)}
                />
                <ChoiceField
                  label={`Curve ${i + 1} l`}
                  value={c.l}
                  disabled={readOnly}
                  choices={range(0, c.n - 1).map((l) => ({
                    value: l,
                    label: `${l} (${angularMomentumLetter(l)})`,
                  }))}
                  onChange={(l) => edit(setRadialCurve(spec, i, { l }), `curves.${i}.l`)}
                />
                <ChoiceField
                  label={`Curve ${i + 1} shows`}
                  value={c.quantity}
                  disabled={readOnly}
                  choices={QUANTITIES}
                  onChange={(quantity) =>
                    edit(setRadialCurve(spec, i, { quantity }), `curves.${i}.quantity`)
                  }
                />
                <RemoveRow
                  show={!readOnly && k.curves.length > 1}
                  label={`Remove curve ${i + 1}`}
                  onClick={() => edit(removeRadialCurve(spec, i), 'curves')}
                />
              </li>
            ))}
          </ol>
          <AddRow
            show={!readOnly && k.curves.length < MAX_RADIAL_CURVES}
            label="Add a curve"
            onClick={() => edit(addRadialCurve(spec), 'curves')}
          />
          <CheckboxField
            label="Also solve for another potential"
            checked={k.potential !== undefined}
            disabled={readOnly}
            onChange={(e) =>
              edit(
                e.target.checked
                  ? patchKind(spec, 'radial', { potential: DEFAULT_POTENTIAL })
                  : patchKind(spec, 'radial', {
                      potential: undefined,
                      curves: k.curves.map((c) => ({ ...c, source: undefined })),
                    }),
                'potential',
              )
            }
          />
          {k.potential !== undefined && (
            <>
              <PotentialControls
                value={k.potential}
                ls={[...new Set(k.curves.map((c) => c.l))]}
                levels={Math.max(...k.curves.map((c) => c.n - c.l))}
                muRatio={systemMassRatio(spec)}
                disabled={readOnly}
                onChange={(potential) => edit(patchKind(spec, 'radial', { potential }), 'potential')}
              />
              <ol className="space-y-2" aria-label="Curve sources">
                {k.curves.map((c, i) =>
                  c.quantity === 'veff' ? null : (
                    <li key={i}>
                      <ChoiceField
                        label={`Curve ${i + 1} from`}
                        value={c.source ?? 'hydrogen'}
                        disabled={readOnly}
                        choices={[
                          { value: 'hydrogen', label: 'Hydrogen (exact)' },
                          { value: 'solved', label: 'The potential above (solved)' },
                        ]}
                        onChange={(source) =>
                          edit(setRadialCurve(spec, i, { source }), `curves.${i}.source`)
                        }
                      />
                    </li>
                  ),
                )}
              </ol>
            </>
          )}
          <OptionalLength
            checkLabel="Fixed radius range"
            label="Radius up to"
            value={k.rMax}
            start={20}
            max={5000}
            autoNote="The radius range follows the curves."
            readOnly={readOnly}
            onChange={(rMax) => edit(patchKind(spec, 'radial', { rMax }), 'rMax')}
          />
          <CheckboxField
            label="Mark radial nodes"
            checked={k.showNodes}
            disabled={readOnly}
            onChange={(e) =>
              edit(patchKind(spec, 'radial', { showNodes: e.target.checked }), 'showNodes')
            }
          />
          <CheckboxField
            label="Mark the most probable radius"
            checked={k.showMostProbable}
            disabled={readOnly}
            onChange={(e) =>
              edit(
                patchKind(spec, 'radial', { showMostProbable: e.target.checked }),
                'showMostProbable',
              )
            }
          />
        </>
      );
    case 'cloud':
      return (
        <div className="grid grid-cols-2 gap-3">
          <NumberField
            label="Points"
            value={k.points}
            min={1000}
            max={200_000}
            step={1000}
            integer
            disabled={readOnly}
            onChange={(points) => edit(patchKind(spec, 'cloud', { points }), 'points')}
          />
          <NumberField
            label="Random seed"
            value={k.seed}
            min={0}
            max={2 ** 31 - 1}
            integer
            disabled={readOnly}
            hint="The same seed gives the same points."
            onChange={(seed) => edit(patchKind(spec, 'cloud', { seed }), 'seed')}
          />
        </div>
      );
    case 'angular':
      return (
        <>
          <ChoiceField
            label="Drawn as"
            value={k.mode}
            disabled={readOnly}
            choices={[
              { value: 'surface', label: 'Surface in 3D' },
              { value: 'curve', label: 'Polar curve in a plane' },
            ]}
            onChange={(mode) => edit(patchKind(spec, 'angular', { mode }), 'mode')}
          />
          <ChoiceField
            label="Quantity"
            value={k.quantity}
            disabled={readOnly}
            choices={[
              { value: 'real', label: 'Signed Y (real orbitals)' },
              { value: 'abs', label: 'Magnitude |Y|' },
            ]}
            onChange={(quantity) => edit(patchKind(spec, 'angular', { quantity }), 'quantity')}
          />
          {k.mode === 'curve' ? (
            <PlaneField
              plane={k.plane}
              disabled={readOnly}
              onChange={(plane) => edit(patchKind(spec, 'angular', { plane }), 'plane')}
            />
          ) : null}
        </>
      );
    case 'levels':
      return (
        <>
          <NumberField
            label="Levels up to n ="
            value={k.nMax}
            min={2}
            max={12}
            integer
            disabled={readOnly}
            onChange={(nMax) => edit(patchKind(spec, 'levels', { nMax }), 'nMax')}
          />
          <ol className="space-y-2" aria-label="Transitions">
            {k.transitions.map((t, i) => (
              <li key={i} className="grid grid-cols-[1fr_1fr_auto] items-end gap-2">
                <ChoiceField
                  label={`Transition ${i + 1} from n =`}
                  value={t.upper}
                  disabled={readOnly}
                  choices={range(2, MAX_TRANSITION_UPPER).map((n) => ({
                    value: n,
                    label: String(n),
                  }))}
                  onChange={(v) =>
                    edit(setTransition(spec, i, 'upper', v), `transitions.${i}.upper`)
                  }
                />
                <ChoiceField
                  label={`Transition ${i + 1} to n =`}
                  value={t.lower}
                  disabled={readOnly}
                  choices={range(1, t.upper - 1).map((n) => ({ value: n, label: String(n) }))}
                  onChange={(v) =>
                    edit(setTransition(spec, i, 'lower', v), `transitions.${i}.lower`)
                  }
                />
                <RemoveRow
                  show={!readOnly}
                  label={`Remove transition ${i + 1}`}
                  onClick={() => edit(removeTransition(spec, i), 'transitions')}
                />
              </li>
            ))}
          </ol>
          <AddRow
            show={!readOnly && k.transitions.length < MAX_TRANSITIONS}
            label="Add a transition"
            onClick={() => edit(addTransition(spec), 'transitions')}
          />
          <CheckboxField
            label="Compare with levels solved for another potential"
            checked={k.compare !== undefined}
            disabled={readOnly}
            onChange={(e) =>
              edit(
                e.target.checked
                  ? patchKind(spec, 'levels', {
                      compare: 'solved-vs-hydrogen',
                      potential: k.potential ?? DEFAULT_POTENTIAL,
                      lMax: k.lMax ?? 2,
                    })
                  : patchKind(spec, 'levels', { compare: undefined, potential: undefined, lMax: undefined }),
                'compare',
              )
            }
          />
          {k.compare !== undefined && k.potential !== undefined && (
            <>
              <PotentialControls
                value={k.potential}
                ls={range(0, k.lMax ?? 2)}
                levels={2}
                muRatio={systemMassRatio(spec)}
                disabled={readOnly}
                onChange={(potential) => edit(patchKind(spec, 'levels', { potential }), 'potential')}
              />
              <NumberField
                label="Solved levels for l up to"
                value={k.lMax ?? 2}
                min={0}
                max={MAX_POTENTIAL_LS - 1}
                integer
                disabled={readOnly}
                onChange={(lMax) => edit(patchKind(spec, 'levels', { lMax }), 'lMax')}
              />
            </>
          )}
        </>
      );
    case 'potential':
      return (
        <>
          <PotentialControls
            value={k.potential}
            ls={k.l}
            levels={k.levels}
            muRatio={systemMassRatio(spec)}
            disabled={readOnly}
            onChange={(potential) => edit(patchKind(spec, 'potential', { potential }), 'potential')}
          />
          <ListField
            label="Angular momenta l"
            values={k.l}
            show={String}
            parse={(l) =>
              Number.isInteger(l) && l >= 0 && l <= MAX_POTENTIAL_L
                ? l
                : `each l must be a whole number from 0 to ${MAX_POTENTIAL_L}`
            }
            maxItems={MAX_POTENTIAL_LS}
            disabled={readOnly}
            hint="Comma-separated, e.g. 0, 1, 2."
            onChange={(l) => edit(patchKind(spec, 'potential', { l: [...new Set(l)] }), 'l')}
          />
          <NumberField
            label="Levels per l"
            value={k.levels}
            min={1}
            max={MAX_SOLVED_LEVELS}
            integer
            disabled={readOnly}
            onChange={(levels) => edit(patchKind(spec, 'potential', { levels }), 'levels')}
          />
          <CheckboxField
            label="Hydrogen's levels, dashed"
            checked={k.compareHydrogen}
            disabled={readOnly}
            onChange={(e) =>
              edit(
                patchKind(spec, 'potential', { compareHydrogen: e.target.checked }),
                'compareHydrogen',
              )
            }
          />
        </>
      );
  }
}

export function KindControls({ spec, onEdit, readOnly }: Props) {
  return (
    <div className="space-y-4">
      <ControlGroup legend="Figure">
        <ChoiceField
          label="Kind of figure"
          value={spec.kind.type}
          disabled={readOnly}
          choices={figureKindNames.map((t) => ({ value: t, label: KIND_NAMES[t] }))}
          onChange={(type) => onEdit(changeKind(spec, type), 'kind.type')}
        />
      </ControlGroup>
      <ControlGroup legend={`${KIND_NAMES[spec.kind.type]} settings`}>
        <KindSettings spec={spec} onEdit={onEdit} readOnly={readOnly} />
      </ControlGroup>
    </div>
  );
}
