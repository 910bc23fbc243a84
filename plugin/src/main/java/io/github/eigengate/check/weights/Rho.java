package io.github.eigengate.check.weights;

import io.github.eigengate.arith.FpPoly;

/**
 * Names one residual representation ρ̄_{f,𝔭}: a form, the rational prime p and the prime 𝔭 | p of the coefficient
 * field, given by the monic irreducible factor of the field polynomial modulo p ({@code null} for a form over Q).
 */
record Rho(String form, int p, FpPoly prime) {
}
