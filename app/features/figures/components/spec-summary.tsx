// The figure spec in words: kind, orbital, atom, drawing and print settings.
import type { FigureSpec } from '../../../../shared/spec/figure-spec';
import type { HouseStyle } from '../../../../shared/spec/house-style';
import { describeSpec } from '../utils/describe-spec';

export function SpecSummary({ spec, houseStyle }: { spec: FigureSpec; houseStyle?: HouseStyle }) {
  return (
    <dl className="grid gap-x-6 gap-y-2 text-sm sm:grid-cols-[8rem_1fr]">
      {describeSpec(spec, houseStyle).map((line) => (
        <div key={line.term} className="contents">
          <dt className="font-semibold text-stone-700">{line.term}</dt>
          <dd className="text-stone-900">{line.detail}</dd>
        </div>
      ))}
    </dl>
  );
}
