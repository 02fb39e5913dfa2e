// Which look and print settings this figure sets itself instead of the house style, and the button
// that clears them all (an ordinary edit: it can be undone).
import { Button } from '../../../components/ui/button';
import type { HouseStyleOverride } from '../utils/house-style-overrides';
import { SETTING_NAMES } from '../utils/house-style-overrides';

export function HouseStylePanel({
  overrides,
  onApply,
  readOnly,
}: {
  overrides: readonly HouseStyleOverride[];
  onApply: () => void;
  readOnly: boolean;
}) {
  if (overrides.length === 0)
    return (
      <p className="text-sm text-stone-700">
        Every look and print setting comes from the project’s house style.
      </p>
    );
  return (
    <div className="space-y-3">
      <table className="w-full text-left text-xs">
        <caption className="mb-1 text-left text-sm text-stone-700">
          This figure sets {overrides.length === 1 ? 'one setting' : `${overrides.length} settings`}{' '}
          of its own:
        </caption>
        <thead className="text-stone-600">
          <tr>
            <th scope="col" className="font-semibold">
              Setting
            </th>
            <th scope="col" className="font-semibold">
              This figure
            </th>
            <th scope="col" className="font-semibold">
              House style
            </th>
          </tr>
        </thead>
        <tbody>
          {overrides.map((o) => (
            <tr key={`${o.section}.${o.field}`} className="border-t border-stone-100">
              <th scope="row" className="py-1 font-normal text-stone-800">
                {SETTING_NAMES[o.field] ?? o.field}
              </th>
              <td className="text-stone-900">{o.figureValue}</td>
              <td className="text-stone-600">{o.houseValue}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {readOnly ? null : (
        <Button size="sm" onClick={onApply}>
          Apply house style (clear these)
        </Button>
      )}
    </div>
  );
}
