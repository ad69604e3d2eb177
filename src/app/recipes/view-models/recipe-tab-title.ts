/** The browser tab's title for a recipe page: the recipe's name, with the page it is on. */
export function recipeTabTitle(url: string, name: string): string {
  const path = url.split(/[?#]/)[0];
  if (path.endsWith('/versions')) return `Versions of ${name} · Commonwort`;
  if (path.endsWith('/brew-day')) return `Brew day: ${name} · Commonwort`;
  return `${name} · Commonwort`;
}
