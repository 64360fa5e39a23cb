import { FormControl } from '@angular/forms';
import * as z from 'zod';
import { SignInRequest, UpdatePreferencesRequest } from '@shared/contracts/session';
import { zodValidator } from './zod-validator';

describe('zodValidator', () => {
  it('uses the contract’s own wording', () => {
    const email = new FormControl('wren@', zodValidator(SignInRequest.shape.email));
    expect(email.errors).toEqual({ message: 'Enter the e-mail address of your account' });
    email.setValue('  Wren@Example.test ');
    expect(email.errors).toBeNull();
  });

  it('words length limits plainly where the contract gives no wording', () => {
    const name = new FormControl('', zodValidator(UpdatePreferencesRequest.shape.displayName.unwrap()));
    expect(name.errors).toEqual({ message: 'This cannot be empty' });
    name.setValue('x'.repeat(121));
    expect(name.errors).toEqual({ message: 'Use at most 120 characters' });
    expect(new FormControl('ab', zodValidator(z.string().min(3))).errors).toEqual({ message: 'Use at least 3 characters' });
  });
});
