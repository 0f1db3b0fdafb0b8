#!/usr/bin/env bash
# Checks the package as a group receives it: packs the tool, installs the tarball in an empty
# folder, and from there runs the CLI, derives the demo catalog, builds the site for it (with a
# non-root site.base; again from a data folder without node_modules), serves it with
# `site preview`, and opens its main pages in headless Chromium (scripts/check-site-pages.ts,
# playwright-core from this checkout's node_modules): no console error, no failed request, nothing
# asked of another host.
# Run by .ci/run after the tests. Usage: scripts/check-pack.sh
set -euo pipefail
root="$(cd "$(dirname "$0")/.." && pwd)"
work="$(mktemp -d)"
preview_pid=""
cleanup() {
  if [ -n "$preview_pid" ]; then kill "$preview_pid" 2>/dev/null || true; fi
  rm -rf "$work"
}
trap cleanup EXIT

cd "$root"
tarball="$(npm pack --silent --pack-destination "$work" | tail -1)"
echo "pack: $tarball ($(du -h "$work/$tarball" | cut -f1))"
if tar -tzf "$work/$tarball" | grep -E '^package/(test|scripts|data-demo|\.scratch)/' >/dev/null; then
  echo "pack: the tarball ships tests, scripts or demo data" >&2; exit 1
fi

mkdir "$work/group" && cd "$work/group"
printf '{ "name": "a-group", "private": true }\n' > package.json
npm install --no-audit --no-fund --prefer-offline --silent "$work/$tarball"
test ! -e node_modules/tsx/package.json || echo "pack: note: tsx is present (pulled in by another package), the bin does not use it"

npx --no-install dawn-census --version
cp "$root/data-demo/catalog.csv" catalog.csv
# A starting config from the catalog alone: it loads, names the installed schema, and derives.
printf 'Name,z_spec,FWHM_Ha,e_FWHM_Ha,F_Ha,F_Ha_err\nA-1,5.1,2100,200,3.1e-17,3e-18\nA-2,6.2,1800,150,2.2e-17,2e-18\nA-3,7.3,2500,300,1.5e-17,2e-18\n' > mine.csv
npx --no-install dawn-census init mine.csv -o started.config.yaml
schema="$(sed -n 's/^# yaml-language-server: \$schema=//p' started.config.yaml)"
test -f "$schema" || { echo "pack: init's schema path $schema does not exist" >&2; exit 1; }
npx --no-install dawn-census derive -c started.config.yaml -o started.parquet --draws 10 --quiet
test -f started.parquet
echo "pack: init wrote a config from a catalog with other column names, naming the installed schema ($schema), and derive ran with it"
sed 's#^site: { base: / }#site: { base: /census/ }#' "$root/data-demo/census.config.yaml" > census.config.yaml
grep -q '^site: { base: /census/ }' census.config.yaml
npx --no-install dawn-census derive -c census.config.yaml --draws 100 --quiet
npx --no-install dawn-census site build -c census.config.yaml --out site
test -f site/index.html
grep -q 'href="/census/' site/index.html || { echo "pack: the built site ignores site.base" >&2; exit 1; }
echo "pack: installed tarball derived the demo catalog and built its site under /census/"
# A site build replaces its whole folder: the folder of the config is refused and left as it was,
# and a second build replaces the first one's folder.
before="$(ls -A | sort | tr '\n' ' ')"
status=0; npx --no-install dawn-census site build -c census.config.yaml --out . 2> refused.log || status=$?
grep -q 'holds census.config.yaml' refused.log || { cat refused.log >&2; echo "pack: site build --out . was not refused" >&2; exit 1; }
[ "$status" = 64 ] || { echo "pack: site build --out . exited $status, not 64" >&2; exit 1; }
after="$(ls -A | grep -v '^refused.log$' | sort | tr '\n' ' ')"
[ "$before" = "$after" ] || { echo "pack: site build --out . changed the folder: $before -> $after" >&2; exit 1; }
npx --no-install dawn-census site build -c census.config.yaml --out site > rebuild.log 2>&1 || { cat rebuild.log >&2; echo "pack: a second site build into the same folder failed" >&2; exit 1; }
test -f site/index.html && test -f site/.dawn-census-site.json
if ls -d site.tmp-dawn-census-* site.old-dawn-census-* >/dev/null 2>&1; then echo "pack: the site build left a staging folder" >&2; exit 1; fi
echo "pack: site build refuses the config's folder (exit 64, nothing changed) and replaces its own earlier site"

# A data folder with no node_modules above it, the tool run from where it is installed (as after a
# global install or with npx): the site build must still find the site's dependencies.
mkdir "$work/data" && cd "$work/data"
cp "$work/group/catalog.csv" "$work/group/census.config.yaml" .
tool="$work/group/node_modules/.bin/dawn-census"
"$tool" derive -c census.config.yaml --draws 100 --quiet
"$tool" site build -c census.config.yaml --out site > build.log 2>&1 || { cat build.log >&2; echo "pack: site build from a data folder without node_modules failed" >&2; exit 1; }
test -f site/index.html
echo "pack: the site builds from a data folder without node_modules of its own"
cd "$work/group"

# Serve the built site from the installed package and open its pages in Chromium.
npx --no-install dawn-census site preview -c census.config.yaml --out site --port 0 > preview.log 2>&1 &
preview_pid=$!
url=""
for _ in $(seq 1 100); do
  url="$(grep -o 'http://[^ ]*' preview.log | head -1 || true)"
  [ -n "$url" ] && break
  kill -0 "$preview_pid" 2>/dev/null || { cat preview.log >&2; echo "pack: site preview stopped" >&2; exit 1; }
  sleep 0.2
done
[ -n "$url" ] || { cat preview.log >&2; echo "pack: site preview did not start" >&2; exit 1; }
case "$url" in */census/) ;; *) echo "pack: site preview serves at $url, not under /census/" >&2; exit 1 ;; esac
(cd "$root" && node_modules/.bin/tsx scripts/check-site-pages.ts "$url" "$work/group/site")
kill "$preview_pid" 2>/dev/null || true
wait "$preview_pid" 2>/dev/null || true
preview_pid=""
echo "pack: the site built from the installed tarball opens in Chromium without errors"
