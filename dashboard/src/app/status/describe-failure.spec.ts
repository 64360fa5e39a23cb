import { HttpErrorResponse } from '@angular/common/http';
import * as z from 'zod';
import { describeFailure } from './describe-failure';

describe('describeFailure', () => {
  it('uses the API’s code, message and per-field messages', () => {
    const err = new HttpErrorResponse({
      status: 400,
      error: { error: { code: 'validation', message: 'Check the form.', details: { email: 'Enter an e-mail address', depth: 3 } } },
    });
    expect(describeFailure(err)).toEqual({ code: 'validation', message: 'Check the form.', fields: { email: 'Enter an e-mail address' } });
  });

  it('tells an unreachable server from a failing one', () => {
    expect(describeFailure(new HttpErrorResponse({ status: 0 })).code).toBe('offline');
    const failing = describeFailure(new HttpErrorResponse({ status: 502, error: '<html>Bad gateway</html>' }));
    expect(failing).toMatchObject({ code: 'http-502', fields: {} });
    expect(failing.message).toContain('HTTP 502');
  });

  it('explains an answer that does not match the contract', () => {
    const parsed = z.object({ id: z.number() }).safeParse({ id: 'seven' });
    expect(describeFailure(parsed.error).code).toBe('unexpected-answer');
  });
});
