/** First path segments of the signed-out pages (see auth.routes.ts). */
export const ACCOUNT_PAGE_PATHS: readonly string[] = ['sign-in', 'forgot-password', 'reset-password', 'invitations'];
