// Module resolution hook of `dawn-census site build` (registered with node:module's register).
// Astro prerenders the pages by importing the server build it writes into the output folder (or
// into .astro/ under the working directory), and those files import the site's dependencies by
// bare name (astro's runtime helpers, @duckdb/node-api, …). Node looks for them in node_modules
// folders above the importing file, and a group's data folder has none when the tool is installed
// elsewhere (globally, through npx, or in another folder). So a bare name that cannot be found
// from a file outside the package is looked up again from the package's own folder. Every other
// resolution, and every name found the first time, is left as it is; when the second look-up
// fails too, the first error is the one reported.

/** file: URL of the package's package.json (set by initialize). */
let packageJsonUrl = '';
/** file: URL of the package folder, ending in '/'. */
let packageRootUrl = '';

/** @param {{ packageRootUrl: string }} data */
export function initialize(data) {
  packageRootUrl = data.packageRootUrl.endsWith('/') ? data.packageRootUrl : `${data.packageRootUrl}/`;
  packageJsonUrl = new URL('package.json', packageRootUrl).href;
}

/** A bare specifier: a package name, not a relative or absolute path and not a URL (node:, file:, data:). */
export function isBareSpecifier(specifier) {
  return !specifier.startsWith('.') && !specifier.startsWith('/') && !specifier.startsWith('#') && !/^[a-zA-Z][a-zA-Z0-9+.-]*:/.test(specifier);
}

export async function resolve(specifier, context, nextResolve) {
  try {
    return await nextResolve(specifier, context);
  } catch (error) {
    const parent = context.parentURL ?? '';
    const retry =
      packageJsonUrl !== '' &&
      error?.code === 'ERR_MODULE_NOT_FOUND' &&
      isBareSpecifier(specifier) &&
      parent.startsWith('file:') &&
      !parent.startsWith(packageRootUrl);
    if (!retry) throw error;
    try {
      return await nextResolve(specifier, { ...context, parentURL: packageJsonUrl });
    } catch {
      throw error;
    }
  }
}
