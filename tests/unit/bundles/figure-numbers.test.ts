// Figure numbers on import and copy: free numbers stay, used ones get the first free suffix, and
// the result never exceeds the 20 characters a figure number may have (shared/api/schemas).
import { describe, expect, it } from 'vitest';
import { figureNumberSchema } from '../../../shared/api/schemas';
import { freeFigureNumber } from '../../../api/services/figure-numbers';

describe('freeFigureNumber', () => {
  it('when the number is free or empty, then it is kept', () => {
    expect(freeFigureNumber('4.1', new Set(['4.2']))).toBe('4.1');
    expect(freeFigureNumber('', new Set(['']))).toBe('');
  });

  it('when the number is used, then the first free suffix from -2 is added', () => {
    expect(freeFigureNumber('4.1', new Set(['4.1']))).toBe('4.1-2');
    expect(freeFigureNumber('4.1', new Set(['4.1', '4.1-2', '4.1-3']))).toBe('4.1-4');
  });

  it('when the number is 20 characters long, then the base is shortened so the result is still a valid number', () => {
    const long = 'A1234567890123456789';
    const renamed = freeFigureNumber(long, new Set([long]));
    expect(renamed).toBe('A12345678901234567-2');
    expect(figureNumberSchema.parse(renamed)).toBe(renamed);
  });
});
