import * as z from 'zod';
import { queryFromView, viewFromQuery } from './query-view';

interface View extends Record<string, unknown> { groupBy: 'line' | 'rabbitry'; top: number; from: string | null }
const fields = {
  groupBy: z.enum(['line', 'rabbitry']),
  top: z.coerce.number().int().min(1).max(25),
  from: z.string().regex(/^\d{4}-\d{2}-\d{2}$/).nullable(),
};
const defaults: View = { groupBy: 'line', top: 8, from: null };

describe('viewFromQuery', () => {
  it('reads each parameter with its schema and keeps defaults for the missing ones', () => {
    expect(viewFromQuery<View>(fields, defaults, { groupBy: 'rabbitry', top: '5' })).toEqual({ groupBy: 'rabbitry', top: 5, from: null });
  });

  it('drops a refused value for that key alone', () => {
    expect(viewFromQuery<View>(fields, defaults, { groupBy: 'colour', top: '99', from: '2026-01-01' })).toEqual({ groupBy: 'line', top: 8, from: '2026-01-01' });
  });

  it('takes the first of repeated parameters and ignores empty ones', () => {
    expect(viewFromQuery<View>(fields, defaults, { top: ['3', '4'], from: '' })).toEqual({ groupBy: 'line', top: 3, from: null });
  });
});

describe('queryFromView', () => {
  it('writes only what differs from the defaults', () => {
    expect(queryFromView<View>({ groupBy: 'line', top: 5, from: null }, defaults)).toEqual({ top: '5' });
    expect(queryFromView<View>(defaults, defaults)).toEqual({});
  });
});
