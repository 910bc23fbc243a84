\\ Writes new-traces.csv next to this file: Tr(T_n | S_k^new(Gamma0(N))) for 1 <= n <= 60, every n (also n not
\\ coprime to N), and atkin-lehner.csv: sum over newforms f (each embedding once) of w_q(f), for q^a || N.
\\ Run from the repository root:  gp -q plugin/src/test/resources/spaces/new-traces.gp
{
  my(S = [[11,2],[12,4],[18,2],[20,2],[24,2],[27,2],[28,2],[30,4],[32,2],[36,2],[45,2],[48,2],[50,2],[54,2],
          [8,6],[9,8],[16,4],[49,2],[60,2],[72,2],[98,2],[75,4],[44,4],[63,2]], B = 60, dir = "plugin/src/test/resources/spaces", f, g, v);
  f = fileopen(Str(dir, "/new-traces.csv"), "w");
  filewrite(f, "# Tr(T_n | S_k^new(Gamma0(N))) = mfcoefs(mftraceform([N,k],0), 60)[n+1], PARI/GP 2.15.2; written by new-traces.gp (same folder)");
  filewrite(f, "level,weight,n,trace");
  g = fileopen(Str(dir, "/atkin-lehner.csv"), "w");
  filewrite(g, "# sum over the newforms f of S_k^new(Gamma0(N)) (every embedding) of w_q(f), q prime, q^a || N: vecsum over i of vecsum(mfatkineigenvalues(mfinit([N,k,1],0), q^a)[i]), and dim = mfdim([N,k,1],0); PARI/GP 2.15.2; written by new-traces.gp");
  filewrite(g, "level,weight,q,dim,trace_w");
  for (s = 1, #S, my(N = S[s][1], k = S[s][2], mf = mfinit([N, k, 1], 0), fa = factor(N)[, 1]);
    v = mfcoefs(mftraceform([N, k], 0), B);
    for (n = 1, B, filewrite(f, Str(N, ",", k, ",", n, ",", v[n + 1])));
    for (j = 1, #fa, my(q = fa[j], A = if (mfdim(mf) == 0, [], mfatkineigenvalues(mf, q^valuation(N, q))));
      filewrite(g, Str(N, ",", k, ",", q, ",", mfdim(mf), ",", sum(i = 1, #A, vecsum(A[i]))))));
  fileclose(f); fileclose(g);
  print("new-traces: ok");
}
quit;
