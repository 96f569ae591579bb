#!/usr/bin/env bash
# Runs the documented Emacs (eglot) configuration headless against the built server (see docs/editors.md).
# Usage: tests/lsp-e2e/emacs/check.sh [path/to/cutsheet.dll]
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
dll="${1:-$here/../../../src/CutSheet.Cli/bin/Debug/net10.0/cutsheet.dll}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
printf 'F = 2 kN\nT = F * 5 mm as N·m\nbad = 1 mm + 2 kg\n' > "$work/sheet.cutsheet"
# eglot asks project.el for the project root; a git repository is one it finds without asking.
git -C "$work" init -q
cd "$work"
CUTSHEET_CMD="dotnet exec $dll lsp" CUTSHEET_EMACS_OUT="$work/out.txt" \
  timeout 90 emacs --batch -q -L "$here" -l "$here/check.el" </dev/null
cat "$work/out.txt"
grep -q '^managed t' "$work/out.txt"
grep -q '^diagnostics t' "$work/out.txt"
grep -q '^diagnostic 3: .*CUT2101' "$work/out.txt"
grep -q '^hover \*\*T\*\* = 10.00 N·m' "$work/out.txt"
grep -q '^formatted F   = 2 kN' "$work/out.txt"
grep -q '^cleared t' "$work/out.txt"
echo "emacs check passed"
