import type { ImportSummary } from '@shared/contracts/imports';
import { outcomeText, progressOf, summaryCounts } from './import-words';

const summary: ImportSummary = {
  totalRows: 415, newRows: 0, alreadyPresent: 412, duplicatesInFile: 1, errorRows: 2, warningRows: 0, skippedRows: 0,
  stubsToCreate: 0, problems: [],
};

describe('import words', () => {
  it('fills the bar when the rows are known and counts rows read when not', () => {
    expect(progressOf({ status: 'committing', processedRows: 103, totalRows: 412 })).toEqual({
      mode: 'determinate', percent: 25, text: 'Importing: 103 of 412 rows (25%)',
    });
    expect(progressOf({ status: 'checking', processedRows: 12000, totalRows: 0 })).toEqual({
      mode: 'indeterminate', percent: 0, text: 'Checking: 12,000 rows read so far',
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
