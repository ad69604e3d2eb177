/** Where to go after signing in: only paths inside the app are followed, never another origin. */
export function safeReturnUrl(candidate: string | null | undefined): string {
  if (!candidate || !candidate.startsWith('/') || candidate.startsWith('//') || candidate.startsWith('/\\')) {
    return '/today';
  }
  return candidate.startsWith('/sign-in') ? '/today' : candidate;
}
