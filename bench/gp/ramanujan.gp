\\ The PARI/GP side of the Ramanujan–Petersson rows of bench/run (Bench.java, RamanujanRow): given
\\   data = "<file written by bench/gp/orbits.gp>"  and  k = <weight>,
\\ for every a_p: c = charpoly(Mod(a_p, f)), then the exact decision "every root of c is real with
\\ alpha^2 <= 4 p^(k-1)", as polsturm of the root-squared h(x^2) = c(x) c(-x) on [0, 4 p^(k-1)]
\\ (all roots of h real in [0, b] iff all roots of c real in [-sqrt b, sqrt b]).
\\ Prints "round <CPU ms>" for 5 rounds and "checksum <#within> <sum of c(1) mod 10^9+7>".
bench_read(data) =
{
  my(L = readstr(data), f = 0, P = List(), A = List());
  for (i = 1, #L, my(s = L[i], v = Vecsmall(s));
    if (#v == 0 || v[1] == 35 || s == "p,value", next);
    my(parts = strsplit(s, ","));
    if (parts[1] == "field", f = eval(parts[2]),
      listput(P, eval(parts[1])); listput(A, eval(parts[2]))));
  [Vec(P), apply(a -> Mod(a, f), Vec(A))];
}
bench_rp(P, A, k) =
{
  my(ok = 0, chk = 0);
  for (i = 1, #A, my(p = P[i], c = charpoly(A[i]), h = substpol(c * subst(c, 'x, -'x), 'x^2, 'x));
    if (issquarefree(h) && polsturm(h, [0, 4 * p^(k - 1)]) == poldegree(h), ok++);
    chk = (chk + subst(c, 'x, 1)) % (10^9 + 7));
  [ok, chk];
}
{
  my(D = bench_read(data), r);
  for (j = 1, 5, gettime(); r = bench_rp(D[1], D[2], k); print("round ", gettime()));
  print("checksum ", r[1], " ", r[2]);
}
