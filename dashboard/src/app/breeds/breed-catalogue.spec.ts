import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import type { BreedRecord } from '@shared/contracts/breeds';
import { validateAsYouType } from '../forms/validate-as-you-type';
import { signInAs, userWith } from '../session/test-users';
import { BreedCatalogue } from './breed-catalogue';

const limits = (min: number | null, ideal: number | null, max: number | null) => ({ minGrams: min, idealGrams: ideal, maxGrams: max });
// An invented breed for the test; its numbers are not any standard's.
const breed: BreedRecord = {
  id: 4, key: 'test-rex', name: 'Test Rex', classScheme: 'four-class', varieties: ['Black', 'Blue'], source: 'from memory', animals: 0,
  weightLimits: {
    buck: { junior: limits(null, null, 1588), intermediate: null, senior: limits(1361, 1814, 2041) },
    doe: { junior: limits(null, null, 1588), intermediate: null, senior: limits(1474, 1928, 2041) },
  },
  evaluationTemplate: { traits: [{ key: 'body_type', label: 'Body type', points: 60 }, { key: 'fur', label: 'Fur', points: 40 }] },
};

describe('BreedCatalogue', () => {
  let backend: HttpTestingController;
  afterEach(() => backend.verify());

  it('lists the breeds with senior limits in the admin’s unit and saves an edited limit in grams', async () => {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting(), validateAsYouType] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(userWith({ isAdmin: true, weightUnit: 'kg' }));
    const fixture = TestBed.createComponent(BreedCatalogue);
    const el = fixture.nativeElement as HTMLElement;
    TestBed.tick();
    backend.expectOne('/api/breeds').flush({ breeds: [breed] });
    await fixture.whenStable();

    expect(el.querySelector('.kl-note')?.textContent).toContain('check every class scheme, weight limit and point');
    const cells = [...el.querySelectorAll('tr.mat-mdc-row td')].map((td) => td.textContent?.replace(/[\s\u00a0]+/g, ' ').trim());
    expect(cells.slice(0, 4)).toEqual(['Test Rex', 'Four-class (junior, senior)', 'Black, Blue', 'Bucks 1.36 kg – 2.04 kg Does 1.47 kg – 2.04 kg']);

    [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Edit')!.click();
    await fixture.whenStable();
    const max = el.querySelector<HTMLInputElement>('input[name="bucksenior' + 'maxGrams"]')!;
    expect(max.value).toBe('2.04 kg');
    max.value = '2.1';
    max.dispatchEvent(new Event('input'));
    await fixture.whenStable();
    expect(el.querySelector('kl-breed-editor mat-error')?.textContent).toContain('has no unit');
    max.value = '2.1 kg';
    max.dispatchEvent(new Event('input'));
    await fixture.whenStable();

    [...el.querySelectorAll('button')].find((b) => b.textContent?.trim() === 'Save breed')!.click();
    TestBed.tick();
    const patch = backend.expectOne({ method: 'PATCH', url: '/api/breeds/4' });
    expect(patch.request.body.weightLimits.buck.senior).toEqual({ minGrams: 1361, idealGrams: 1814, maxGrams: 2100 });
    expect(patch.request.body.weightLimits.doe).toEqual(breed.weightLimits.doe);
    patch.flush({ ...breed, weightLimits: patch.request.body.weightLimits });
    TestBed.tick();
    backend.expectOne('/api/breeds').flush({ breeds: [breed] });
    await fixture.whenStable();
    expect(el.querySelector('kl-breed-editor')).toBeNull();
  });
});
