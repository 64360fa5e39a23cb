/**
 * Where to go after signing in (or retrying): only a path inside this app, never another site
 * ("//host" or "https://…") and never back to the sign-in screen itself.
 */
export function safeReturnUrl(raw: string | null | undefined): string {
  if (!raw || !raw.startsWith('/') || raw.startsWith('//') || raw.startsWith('/\\')) return '/';
  if (raw === '/sign-in' || raw.startsWith('/sign-in?') || raw.startsWith('/error')) return '/';
  return raw;
}
