#!/usr/bin/env bash
# Follows the top-level README's two commands on a fresh clone, as a new user would:
#
#   wizard/hobwright demo      → builds the tool on first use, writes hobwright-out/
#   mvn -B verify              → runs every test
#
#   samples/src/test/sh/fresh-clone.sh [REPOSITORY [REVISION]]
#
# Defaults: the repository this script is in, and the commit checked out here.
#
# Set FRESH_MAVEN_REPO=1 to start from an empty local Maven repository as well (downloads about
# 60 MB from Maven Central). Exits non-zero, saying which step failed, when anything is missing.
set -euo pipefail
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
source_repo="${1:-$(git -C "$here" rev-parse --show-toplevel)}"
revision="${2:-$(git -C "$here" rev-parse HEAD)}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT

fail() { echo "fresh-clone: FAILED: $*" >&2; exit 1; }

git clone -q "$source_repo" "$work/hobwright"
cd "$work/hobwright"
git checkout -q "$revision"
echo "fresh-clone: cloned $(git log --oneline -1) into $work/hobwright"

if [ "${FRESH_MAVEN_REPO:-0}" = 1 ]; then
  mkdir -p "$work/m2"
  export MAVEN_OPTS="${MAVEN_OPTS:-} -Dmaven.repo.local=$work/m2"
fi
export HOBWRIGHT_HOME="$work/home"          # no saved machines or templates from this computer

echo "fresh-clone: wizard/hobwright demo"
wizard/hobwright demo > "$work/demo.out" 2> "$work/demo.err" || { cat "$work/demo.err" >&2; fail "the demo command"; }
for ext in nc csv html json; do
  compgen -G "hobwright-out/*.$ext" >/dev/null || fail "the demo wrote no .$ext file into hobwright-out/"
done
echo "fresh-clone: demo wrote: $(cd hobwright-out && ls | tr '\n' ' ')"
grep -qi caution hobwright-out/*.nc || fail "the program has no caution"
grep -qi caution hobwright-out/*.html || fail "the setup sheet has no caution"

echo "fresh-clone: the launcher through a link, from another folder whose name has a space"
mkdir -p "$work/my bin" "$work/elsewhere"
ln -s "$work/hobwright/wizard/hobwright" "$work/my bin/hobwright"
( cd "$work/elsewhere" && "$work/my bin/hobwright" plan "$work/hobwright/samples/scenario/jobs/dosing-pinion-z12.json" \
    --out "out dir" > "$work/link.out" 2>&1 ) || { cat "$work/link.out" >&2; fail "the launcher started through a link"; }
[ -f "$work/elsewhere/out dir/dosing-pinion-z12.nc" ] || fail "the linked launcher wrote no program into the folder asked for"

echo "fresh-clone: mvn -B verify"
mvn -B verify > "$work/verify.out" 2>&1 || { tail -60 "$work/verify.out" >&2; fail "mvn -B verify"; }
grep -E "Tests run: [0-9]+, Failures: 0, Errors: 0" "$work/verify.out" | grep -v " -- in "

[ -z "$(git status --porcelain)" ] || fail "the two commands left changes that .gitignore does not cover: $(git status --porcelain)"
echo "fresh-clone: OK"
