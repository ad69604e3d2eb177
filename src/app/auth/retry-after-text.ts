/** "30 seconds", "about 5 minutes": a server-imposed wait in words. */
export function retryAfterText(seconds: number): string {
  if (seconds < 60) {
    return `${Math.max(1, Math.round(seconds))} seconds`;
  }
  const minutes = Math.ceil(seconds / 60);
  return minutes === 1 ? 'about a minute' : `about ${minutes} minutes`;
}
