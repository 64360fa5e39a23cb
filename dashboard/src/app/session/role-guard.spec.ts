import { provideHttpClient } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { TestBed } from '@angular/core/testing';
import { ActivatedRouteSnapshot, GuardResult, RedirectCommand, Router, RouterStateSnapshot, convertToParamMap, provideRouter } from '@angular/router';
import { clubMemberGuard, rabbitryMemberGuard } from './role-guard';
import { signInAs, userWith } from './test-users';

const member = userWith({
  rabbitries: [{ id: 7, name: 'Brackenrow', slug: 'brackenrow', role: 'partner' }],
  clubs: [{ id: 3, name: 'Saltmeadow Fanciers', role: 'member' }],
});

function run(guard: typeof rabbitryMemberGuard, params: Record<string, string>): Promise<GuardResult> {
  const route = { paramMap: convertToParamMap(params) } as ActivatedRouteSnapshot;
  return TestBed.runInInjectionContext(() => guard(route, { url: '/somewhere' } as RouterStateSnapshot)) as Promise<GuardResult>;
}

// The guard awaits the known user before it asks again; let that settle first.
const settle = () => new Promise((resolve) => setTimeout(resolve));

describe('rabbitryMemberGuard and clubMemberGuard', () => {
  let backend: HttpTestingController;

  beforeEach(async () => {
    TestBed.configureTestingModule({ providers: [provideRouter([]), provideHttpClient(), provideHttpClientTesting()] });
    backend = TestBed.inject(HttpTestingController);
    await signInAs(member);
  });

  afterEach(() => backend.verify());

  it('lets a member into their own rabbitry and club without asking the API again', async () => {
    expect(await run(rabbitryMemberGuard, { rabbitryId: '7' })).toBe(true);
    expect(await run(clubMemberGuard, { clubId: '3' })).toBe(true);
  });

  it('shows not-found at the same address for a rabbitry the user holds no role in', async () => {
    const result = run(rabbitryMemberGuard, { rabbitryId: '8' });
    // It asks once more, in case access was granted after the page loaded.
    await settle();
    backend.expectOne('/api/session').flush({ user: member, csrfToken: 't' });
    const outcome = await result;
    expect(outcome).toBeInstanceOf(RedirectCommand);
    const command = outcome as RedirectCommand;
    expect(TestBed.inject(Router).serializeUrl(command.redirectTo)).toBe('/not-found');
    expect(command.navigationBehaviorOptions?.skipLocationChange).toBe(true);
  });

  it('lets the user in when the fresh answer shows the new grant', async () => {
    const result = run(clubMemberGuard, { clubId: '4' });
    await settle();
    backend.expectOne('/api/session').flush({
      user: { ...member, clubs: [...member.clubs, { id: 4, name: 'Upland Lop Circle', role: 'officer' }] },
      csrfToken: 't',
    });
    expect(await result).toBe(true);
  });
});
