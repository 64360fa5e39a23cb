import { TestBed } from '@angular/core/testing';
import { BREEDING_CAUTIONS, JUDGMENT_REMINDER, LINE_CAUTIONS } from '@shared/domain/cautions';
import { CautionsNote } from './cautions-note';

describe('CautionsNote', () => {
  beforeEach(() => sessionStorage.clear());

  async function show(panel: string, cautions: readonly string[] = BREEDING_CAUTIONS) {
    const fixture = TestBed.createComponent(CautionsNote);
    fixture.componentRef.setInput('panel', panel);
    fixture.componentRef.setInput('cautions', cautions);
    await fixture.whenStable();
    return fixture;
  }
  const items = (el: HTMLElement) => [...el.querySelectorAll('li')].map((li) => li.textContent?.trim());
  const button = (el: HTMLElement, name: string) => [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === name)!;

  it('lists the panel’s cautions, led by the reminder that the numbers support the breeder’s judgment', async () => {
    const el: HTMLElement = (await show('lines', LINE_CAUTIONS)).nativeElement;
    expect(items(el)).toEqual([...LINE_CAUTIONS]);
    expect(el.querySelector('.reminder')?.textContent).toContain(JUDGMENT_REMINDER);
    expect(el.textContent).toContain('do not replace a judge, the official breed standard or a veterinarian');
  });

  it('goes away when hidden and stays away for the visit, per panel, with a way back', async () => {
    const fixture = await show('keepers');
    const el: HTMLElement = fixture.nativeElement;
    button(el, 'Hide cautions').click();
    await fixture.whenStable();
    expect(el.querySelector('aside')).toBeNull();
    expect((await show('keepers')).nativeElement.querySelector('aside')).toBeNull();
    expect((await show('traits')).nativeElement.querySelector('aside')).not.toBeNull();

    button(el, 'Show the cautions').click();
    await fixture.whenStable();
    expect(el.querySelector('aside')).not.toBeNull();
    expect((await show('keepers')).nativeElement.querySelector('aside')).not.toBeNull();
  });
});
