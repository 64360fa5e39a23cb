import type { ImportSummary } from '@shared/contracts/imports';
import { outcomeText, progressOf, summaryCounts } from './import-words';

const summary: ImportSummary = {
  totalRows: 415, newRows: 0, alreadyPresent: 412, duplicatesInFile: 1, errorRows: 2, warningRows: 0, skippedRows: 0,
  stubsToCreate: 0, problems: [],
};

describe('import words', () => {
  it('fills the bar by the share the API reports, counting rows read and rows written', () => {
    expect(progressOf({ status: 'checking', processedRows: 12000, progress: 0.2475, summary: null })).toEqual({
      mode: 'determinate', percent: 24, text: 'Checking: 12,000 rows read (24%)',
    });
    expect(progressOf({ status: 'committing', processedRows: 103, progress: 0.25, summary: { ...summary, newRows: 412 } })).toEqual({
      mode: 'determinate', percent: 25, text: 'Importing: 103 of 412 new rows, 25%',
    });
    expect(progressOf({ status: 'committing', processedRows: 0, progress: 0.2, summary: { ...summary, newRows: 412 } }).text).toBe('Importing: 20%');
  });

  it('shows 100% only once the step is over, and a moving bar when no share is known', () => {
    expect(progressOf({ status: 'checking', processedRows: 415, progress: 1, summary: null }).percent).toBe(99);
    expect(progressOf({ status: 'checking', processedRows: 12000, progress: null, summary: null })).toEqual({
      mode: 'indeterminate', percent: 0, text: 'Checking: 12,000 rows so far',
    });
  });

  it('lists the counts of a check, leaving out empty extras', () => {
    expect(summaryCounts(summary).map((c) => `${c.label} ${c.value}`)).toEqual([
      'Rows read 415', 'New 0', 'Already present 412', 'Repeated in the file 1', 'Rows with errors 2',
    ]);
  });

  it('tells an import’s outcome', () => {
    expect(outcomeText({ status: 'done', message: '0 new, 412 already present', summary })).toBe('0 new, 412 already present');
    expect(outcomeText({ status: 'checked', message: null, summary })).toBe('0 new, 412 already present, 2 with errors');
    expect(outcomeText({ status: 'uploaded', message: null, summary: null })).toBe('');
  });
});
