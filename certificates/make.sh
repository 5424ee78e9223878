#!/usr/bin/env bash
# Regenerates the stored certificates from their inputs (seed 0, contract-first), after
# `mvn -B verify` has built target/chirocore.jar. The test suite re-verifies every *.cert.json here.
set -euo pipefail
cd "$(dirname "$0")/.."
chirocore() { java -Xmx2g -jar target/chirocore.jar "$@"; }
for f in fano fano-dual ag32 ag23-minus-point fano-in-70; do
  chirocore reduce "certificates/inputs/$f.json" --out "certificates/$f.cert.json"
done
for n in 3 4 5 6 7 8; do
  # H = the unit vectors 10...0,01...0,...,0...01; O = the all-ones vertex.
  h=""
  for i in $(seq 1 "$n"); do
    v=""
    for j in $(seq 1 "$n"); do
      if [ "$i" = "$j" ]; then v="${v}1"; else v="${v}0"; fi
    done
    h="${h:+$h,}$v"
  done
  chirocore reduce --cube "$n" --hyperplane "$h" --pull "$(printf '1%.0s' $(seq 1 "$n"))" \
    --out "certificates/corner-n$n.cert.json"
done
# The largest corner core (n = 9, 15 elements) with matrix witnesses wherever the real cube gives
# one (docs/realisations.md, "Matrix witnesses in certificates").
chirocore reduce --cube 9 --hyperplane 100000000,010000000,001000000,000100000,000010000,000001000,000000100,000000010,000000001 \
  --pull 111111111 --matrix-witnesses --out certificates/corner-n9-matrices.cert.json
