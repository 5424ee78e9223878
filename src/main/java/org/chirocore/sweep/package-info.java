/**
 * The sweep over every general-position pull of the real n-cube up to the cube's symmetry group:
 * hyperplane orbits, general-position pairs, the decision and certification of every pull, shard
 * runs and their merge. Depends on {@code matroid}, {@code orient} (budgets), {@code search},
 * {@code cert}, {@code pipeline} (certify, write, verify), {@code check} (re-verifying existing
 * files), {@code family} (shards) and {@code io}; never on the CLI.
 */
package org.chirocore.sweep;
