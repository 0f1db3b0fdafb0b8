/**
 * The tables the build published beside `census` (`readings`, `population`), as it wrote them on
 * <body data-extra-tables>: the browser registers only these, so a site without population
 * results never asks for their file (a 404 in the console of every page that opens the database).
 */
export function publishedTables(): string[] {
  return (document.body.dataset.extraTables ?? '').split(' ').filter(Boolean);
}
