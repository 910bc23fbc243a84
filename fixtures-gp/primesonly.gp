default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/primesonly: every newform orbit of S_k^new(Gamma0(N)) for the
\\ spaces below, given as a primes-only table (a_1 and a_p for primes p <= 100), with the Atkin-Lehner
\\ eigenvalues w_q (mfatkineigenvalues) for every prime q | N and the root number of the L-function
\\ (lfunrootres(lfunmf(mf, f))[3], computed numerically and independently of w_q).
read("fixtures-gp/lib.gp");
{
  my(dir = "plugin/src/test/resources/datasets/primesonly", script = "primesonly", B = 100,
     spaces = [[11, 2], [20, 2], [23, 2], [27, 2], [29, 2], [30, 2], [37, 2], [11, 4], [13, 4], [18, 4], [5, 6], [1, 12]],
     forms = [], al = List(), f, lines);
  lines = ["trivial character; a_1 and a_p for primes p <= 100 only (a primes-only table)",
           "atkin_lehner = q:w_q for every prime q | N, w_q = mfatkineigenvalues(mf, q^v_q(N))[i][1] (the same for every embedding);",
           "root_number = lfunrootres(lfunmf(mf, mfeigenbasis(mf)[i]))[3] (every embedding), rounded and checked to be +-1"];
  system(Str("mkdir -p ", dir));
  for (s = 1, #spaces, my(N = spaces[s][1], k = spaces[s][2], mf = mfinit([N, k, 1], 0), L = mfeigenbasis(mf), F = mffields(mf), recs);
    recs = fx_space(N, k, B, 0);
    forms = concat(forms, recs);
    for (i = 1, #L,
      my(fa = factor(N)[, 1], sig = "", eps);
      for (j = 1, #fa, my(q = fa[j], w = Set(mfatkineigenvalues(mf, q^valuation(N, q))[i]));
        if (#w != 1 || abs(w[1]) != 1, fx_err("Atkin-Lehner eigenvalue not a rational sign"));
        sig = Str(sig, if (j > 1, ";", ""), q, ":", if (w[1] > 0, "+1", "-1")));
      my(Lf = lfunmf(mf, L[i])); if (poldegree(F[i]) == 1, Lf = [Lf]);
      eps = Set(apply(x -> round(real(lfunrootres(x)[3])), Lf));
      if (#eps != 1 || abs(eps[1]) != 1, fx_err("root number"));
      listput(al, [sig, if (eps[1] > 0, "+1", "-1")])));
  for (i = 1, #forms, fx_check_hecke(forms[i]));
  for (i = 1, #spaces, fx_check_traces(spaces[i][1], spaces[i][2], forms));
  \\ forms.csv with the two extra columns
  f = fileopen(Str(dir, "/forms.csv"), "w");
  fx_header(f, script, concat(lines, ["newforms of S_k^new(Gamma0(N)) from mfeigenbasis(mfinit([N,k,1],0)); id lev<N>_wt<k>_o<i>, i = position in mfeigenbasis",
     "field = mffields(mfinit([N,k,1],0))[i] with y renamed x (empty when rational)"]));
  filewrite(f, "id,level,weight,character,field,atkin_lehner,root_number");
  for (i = 1, #forms, my(r = forms[i]);
    filewrite(f, Str(r[1], ",", r[2], ",", r[3], ",,", if (r[4] == 0, "", fx_fmt(r[4])), ",", al[i][1], ",", al[i][2])));
  fileclose(f);
  \\ coefficients.csv: n = 1 and primes only
  f = fileopen(Str(dir, "/coefficients.csv"), "w");
  fx_header(f, script, concat(lines, ["value = lift(mfcoefs(mfeigenbasis(mfinit([N,k,1],0))[i], B)[n+1]) with y replaced by x, reduced mod the field polynomial; n = 1 and primes n <= 100"]));
  filewrite(f, "form,n,value");
  for (i = 1, #forms, my(r = forms[i]);
    for (n = 1, B, if (n == 1 || isprime(n), filewrite(f, Str(r[1], ",", n, ",", fx_fmt(r[5][n]))))));
  fileclose(f);
  fx_write_spaces(dir, script, spaces);
  print("primesonly: ok");
}
quit;
