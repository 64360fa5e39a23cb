import { FormControl } from '@angular/forms';
import { pastDateValidator } from './date-input';

describe('pastDateValidator', () => {
  const today = () => '2026-11-30';
  it('accepts today and earlier days, refuses later ones and non-dates', () => {
    const control = new FormControl('2026-11-30', pastDateValidator(true, today));
    expect(control.errors).toBeNull();
    control.setValue('2026-12-01');
    expect(control.errors).toEqual({ message: 'The date is after today (2026-11-30)' });
    control.setValue('2026-02-30');
    expect(control.errors).toEqual({ message: 'Give a date as YYYY-MM-DD' });
  });

  it('requires a date only where asked', () => {
    expect(new FormControl('', pastDateValidator(true, today)).errors).toEqual({ message: 'Give the date' });
    expect(new FormControl('', pastDateValidator(false, today)).errors).toBeNull();
  });
});
