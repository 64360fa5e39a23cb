import { TestbedHarnessEnvironment } from '@angular/cdk/testing/testbed';
import { Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MatSelectHarness } from '@angular/material/select/testing';
import type { Sex } from '@shared/domain/terms';
import { DateRangeFilter } from './date-range-filter';
import { SexFilter } from './sex-filter';

@Component({
  template: `
    <kl-sex-filter label="Offspring" [value]="sex()" (valueChange)="sex.set($event); sexChosen.push($event)" />
    <kl-date-range-filter fromLabel="Shows from" toLabel="Shows to" [from]="from()" [to]="to()" (fromChange)="from.set($event)" (toChange)="to.set($event)" />
  `,
  imports: [SexFilter, DateRangeFilter],
})
class FiltersHost {
  readonly sex = signal<Sex | undefined>('doe');
  readonly sexChosen: (Sex | undefined)[] = [];
  readonly from = signal<string | undefined>('2025-03-01');
  readonly to = signal<string | undefined>(undefined);
}

describe('SexFilter and DateRangeFilter', () => {
  async function show() {
    const fixture = TestBed.createComponent(FiltersHost);
    await fixture.whenStable();
    return { fixture, host: fixture.componentInstance, el: fixture.nativeElement as HTMLElement, loader: TestbedHarnessEnvironment.loader(fixture) };
  }

  it('labels each field with the panel’s own words', async () => {
    const { el } = await show();
    expect([...el.querySelectorAll('mat-label')].map((l) => l.textContent?.trim())).toEqual(['Offspring', 'Shows from', 'Shows to']);
    const from = el.querySelector<HTMLInputElement>('input[name="from"]')!;
    expect(el.querySelector(`label[for="${from.id}"]`)?.textContent?.trim()).toBe('Shows from');
  });

  it('shows the sex held and reports a new choice, with bucks and does as none', async () => {
    const { host, loader } = await show();
    const select = await loader.getHarness(MatSelectHarness.with({ selector: 'kl-sex-filter mat-select' }));
    expect(await select.getValueText()).toBe('Does');
    await select.open();
    expect((await select.getOptions()).length).toBe(3);
    expect(await Promise.all((await select.getOptions()).map((o) => o.getText()))).toEqual(['Bucks and does', 'Bucks', 'Does']);
    await select.clickOptions({ text: 'Bucks' });
    await select.open();
    await select.clickOptions({ text: 'Bucks and does' });
    expect(host.sexChosen).toEqual(['buck', undefined]);
  });

  it('shows the dates held and reports each end’s change, a cleared end as none', async () => {
    const { fixture, host, el } = await show();
    const from = el.querySelector<HTMLInputElement>('input[name="from"]')!;
    const to = el.querySelector<HTMLInputElement>('input[name="to"]')!;
    expect([from.value, to.value]).toEqual(['2025-03-01', '']);
    to.value = '2025-10-31';
    to.dispatchEvent(new Event('change'));
    from.value = '';
    from.dispatchEvent(new Event('change'));
    await fixture.whenStable();
    expect([host.from(), host.to()]).toEqual([undefined, '2025-10-31']);
  });
});
