import { TestBed } from '@angular/core/testing';
import { CautionsNote, PANEL_CAUTIONS } from './cautions-note';

describe('CautionsNote', () => {
  beforeEach(() => sessionStorage.clear());

  async function show(cautions: string[] | null, panel = 'growth') {
    const fixture = TestBed.createComponent(CautionsNote);
    fixture.componentRef.setInput('panel', panel);
    fixture.componentRef.setInput('cautions', cautions);
    await fixture.whenStable();
    return fixture;
  }
  const items = (el: HTMLElement) => [...el.querySelectorAll('li')].map((li) => li.textContent?.trim());

  it('shows the usual cautions with the reminder said once', async () => {
    const el: HTMLElement = (await show(null)).nativeElement;
    expect(items(el)).toEqual([...PANEL_CAUTIONS]);
    expect(el.querySelector('.reminder')?.textContent).toContain('do not replace a judge, the official breed standard or a veterinarian');
  });

  it('takes a report’s own cautions, leaving out its copy of the reminder', async () => {
    const el: HTMLElement = (await show(['Support the hindquarters.', 'These figures support your judgment; they do not replace a judge, the official breed standard or a veterinarian.'])).nativeElement;
    expect(items(el)).toEqual(['Support the hindquarters.']);
  });

  it('goes away when hidden and stays away for the visit, per panel', async () => {
    const fixture = await show(null, 'keepers');
    (fixture.nativeElement as HTMLElement).querySelector('button')!.click();
    await fixture.whenStable();
    expect((fixture.nativeElement as HTMLElement).querySelector('aside')).toBeNull();
    expect((await show(null, 'keepers')).nativeElement.querySelector('aside')).toBeNull();
    expect((await show(null, 'traits')).nativeElement.querySelector('aside')).not.toBeNull();
  });
});
