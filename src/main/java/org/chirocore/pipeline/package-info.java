/**
 * The certified pipeline every command that writes a certificate goes through: build (or read),
 * reduce, certify, write atomically, and verify the written file with the independent checker.
 * May import {@code matroid}, {@code orient}, {@code search}, {@code cert}, {@code io} and the
 * checker's public entry point {@code check.CertificateVerifier}; never the CLI, {@code family}
 * or {@code report}.
 */
package org.chirocore.pipeline;
