default(parisizemax, 2^31)
\\ Writes the Hecke-eigenvalue data of the benchmark rows to bench/data/ (run from the repository root:
\\   gp -q bench/gp/orbits.gp
\\ ). One file per orbit: the field polynomial, then a_p for the primes p < B with p not dividing N, each a_p
\\ written as a polynomial in x (x = PARI's generator of mffields(mf)[i], or polredbest's when noted).
read("fixtures-gp/lib.gp");
bench_orbit(name, N, k, i, B, red) =
{
  my(r = fx_form(N, k, i, B, red), f = fileopen(Str("bench/data/", name, ".csv"), "w"));
  filewrite(f, Str("# newform orbit ", i, " of mfeigenbasis(mfinit([", N, ",", k, ",1],0)), degree ", poldegree(r[4]), "; a_p for primes p < ", B, ", p not dividing ", N));
  filewrite(f, Str("# written by bench/gp/orbits.gp (fixtures-gp/lib.gp fx_form(", N, ",", k, ",", i, ",", B, ",", red, ")), PARI/GP ", fx_version(), ", ", fx_date()));
  if (r[6] != "", filewrite(f, Str("# ", r[6])));
  filewrite(f, "p,value");
  filewrite(f, Str("field,", fx_fmt(r[4])));
  forprime (p = 2, B - 1, if (N % p, filewrite(f, Str(p, ",", fx_fmt(r[5][p])))));
  fileclose(f);
  print(name, ": degree ", poldegree(r[4]));
}
bench_orbit("s2-389-deg20", 389, 2, 5, 1000, 0);
bench_orbit("s2-997-deg42", 997, 2, 8, 1000, 0);
bench_orbit("s240-1-deg20", 1, 240, 1, 60, 1);
quit;
