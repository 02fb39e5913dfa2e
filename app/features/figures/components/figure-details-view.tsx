// Title, number, caption and alt text for members who may read but not edit.
import type { Figure } from '../../../../shared/api/schemas';

const Empty = () => <span className="italic text-stone-500">none</span>;

export function FigureDetailsView({
  figure,
}: {
  figure: Pick<Figure, 'number' | 'title' | 'caption' | 'altText'>;
}) {
  return (
    <dl className="grid gap-x-6 gap-y-3 text-sm sm:grid-cols-[8rem_1fr]">
      <dt className="font-semibold text-stone-700">Number</dt>
      <dd>{figure.number || <Empty />}</dd>
      <dt className="font-semibold text-stone-700">Title</dt>
      <dd>{figure.title}</dd>
      <dt className="font-semibold text-stone-700">Caption</dt>
      <dd className="whitespace-pre-line">{figure.caption || <Empty />}</dd>
      <dt className="font-semibold text-stone-700">Alt text</dt>
      <dd className="whitespace-pre-line">{figure.altText || <Empty />}</dd>
    </dl>
  );
}
