#!/usr/bin/env bash
# Regenerates the bundled demo structures in examples/ with conformark's own build command (fixed seeds, so the
# files come out byte for byte the same). The ring trajectory is made by scripts/make-ring-walk.mjs.
set -euo pipefail
cd "$(dirname "$0")/.."
cm() { node bin/conformark.js "$@"; }
cm build 'C[C@@H]1CCCC[C@H]1O' --ring-forms --conformers 8 --seed 11 \
  --title 'W2 trans-2-methylcyclohexan-1-ol' -o examples/w2-methylcyclohexanol.sdf
cm build 'CO[C@@H]1O[C@H](CO)[C@@H](O)[C@H](O)[C@H]1O' --conformers 4 --seed 5 \
  --title 'W3 methyl beta-D-glucopyranoside' -o examples/w3-methyl-glucoside.sdf
cm build 'C[C@@H]1OCC[C@@H]1O' --conformers 6 --seed 3 \
  --title 'W4 2-methyloxolan-3-ol' -o examples/w4-methyloxolanol.sdf
