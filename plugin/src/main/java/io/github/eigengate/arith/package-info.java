/**
 * Exact arithmetic for checking tables of modular forms: rationals ({@link
 * io.github.eigengate.arith.Rational}), polynomials over Q and F_p ({@link
 * io.github.eigengate.arith.QPoly}, {@link io.github.eigengate.arith.FpPoly}), number fields
 * {@code Q[x]/(f)} ({@link io.github.eigengate.arith.NumberField}), finite fields ({@link
 * io.github.eigengate.arith.FiniteField}), real-root counting by Sturm sequences ({@link
 * io.github.eigengate.arith.RealRoots}), factorisation over Q ({@link
 * io.github.eigengate.arith.ZFactorization}) and reduction modulo primes of number fields ({@link
 * io.github.eigengate.arith.ResidueMap}).
 *
 * <p>Nothing here is decided in floating point. All value types are immutable with canonical
 * forms, so {@code equals} is mathematical equality. The package has no dependency outside the JDK.
 */
package io.github.eigengate.arith;
