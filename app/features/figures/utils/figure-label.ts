// How a figure is named in labels and messages: "figure 4.3", or its title when it has no number.
import type { FigureSummary } from '../../../../shared/api/schemas';

export function figureLabel(figure: Pick<FigureSummary, 'number' | 'title'>): string {
  return figure.number ? `figure ${figure.number}` : `“${figure.title}”`;
}
