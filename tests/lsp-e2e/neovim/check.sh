#!/usr/bin/env bash
# Runs the documented Neovim configuration headless against the built server (see docs/editors.md).
# Usage: tests/lsp-e2e/neovim/check.sh [path/to/cutsheet.dll]
set -euo pipefail
here="$(cd "$(dirname "$0")" && pwd)"
dll="${1:-$here/../../../src/CutSheet.Cli/bin/Debug/net10.0/cutsheet.dll}"
work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
mkdir -p "$work/lua"
cp "$here/cutsheet.lua" "$work/lua/cutsheet.lua"
printf 'F = 2 kN\nT = F * 5 mm as N·m\nbad = 1 mm + 2 kg\n' > "$work/sheet.cutsheet"
cd "$work"
CUTSHEET_CMD="dotnet exec $dll lsp" CUTSHEET_NVIM_OUT="$work/out.txt" \
  timeout 60 nvim --headless -u NONE --cmd "set rtp^=$work" --cmd "lua require('cutsheet')" \
  -c "luafile $here/check.lua" sheet.cutsheet
cat "$work/out.txt"
grep -q '^diagnostics true' "$work/out.txt"
grep -q '^diagnostic 2:.*CUT2101' "$work/out.txt"
grep -q '^hover \*\*T\*\* = 10.00 N·m' "$work/out.txt"
grep -q '^lens T → 10.00 N·m' "$work/out.txt"
grep -q '^cleared true' "$work/out.txt"
echo "neovim check passed"
