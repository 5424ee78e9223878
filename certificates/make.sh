#!/usr/bin/env bash
# Regenerates the stored certificates from their inputs (seed 0, contract-first), after
# `mvn -B verify` has built target/chirocore.jar. The test suite re-verifies every *.cert.json here.
set -euo pipefail
cd "$(dirname "$0")/.."
chirocore() { java -Xmx2g -jar target/chirocore.jar "$@"; }
for f in fano fano-dual ag32 ag23-minus-point; do
  chirocore reduce "certificates/inputs/$f.json" --out "certificates/$f.cert.json"
done
for n in 3 4 5 6; do
  h=$(for i in $(seq 1 "$n"); do for j in $(seq 1 "$n"); do [ "$i" = "$j" ] && printf 1 || printf 0; done; [ "$i" -lt "$n" ] && printf ,; done)
  chirocore reduce --cube "$n" --hyperplane "$h" --pull "$(printf '1%.0s' $(seq 1 "$n"))" \
    --out "certificates/corner-n$n.cert.json"
done
