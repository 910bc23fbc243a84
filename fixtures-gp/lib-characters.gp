\\ Helpers for datasets of newforms with a character (read by characters.gp and example-characters.gp after lib.gp).
\\ See the header of characters.gp for the conventions (character cell, absolute field, zeta). The global B is the
\\ number of coefficients; IDFMT(N, k, o, i) makes an id.

ch_cell(G, chi) =
{
  my(s = "");
  for (j = 1, #G.gen, s = Str(s, if (j > 1, ";", ""), G.gen[j], ":", chi[j], "/", G.cyc[j]));
  s;
}

\\ chi(n) as an element of Q[x]/(Q) (a polynomial in x), given zeta; o = order.
ch_value(G, chi, o, n, zeta, Q) =
{
  if (gcd(n, G.mod) != 1, return(0));
  my(e = chareval(G, chi, n) * o);   \\ chareval: chi(n) = exp(2 pi i * value), value in [0,1)
  if (o <= 2, return((-1)^e));
  lift(Mod(zeta, Q)^e);
}

\\ One record [id, N, k, Q, c, note, cell, zeta, o]: Q = 0 for a rational form.
ch_form(N, k, chi, i) =
{
  my(G = znstar(N, 1), mf = mfinit([N, k, [G, chi]], 0), L = mfeigenbasis(mf), F = mffields(mf),
     o = charorder(G, chi), T = mfparams(mf)[5], v = mfcoefs(L[i], B), P, a, kk, Q, c, zeta, note = "");
  if (o <= 2,
    P = subst(liftall(F[i]), 't, -1);
    c = vector(B, n, subst(liftall(v[n + 1]), 't, -1));
    if (poldegree(P, 'y) == 1,
      Q = 0; c = apply(z -> my(w = subst(z, 'y, -polcoef(P, 0, 'y))); if (type(w) != "t_INT", fx_err("non-integral")); w, c),
      my(R = polredbest(P, 1)); Q = subst(R[1], 'y, 'x);
      c = apply(z -> lift(Mod(subst(z, 'y, subst(lift(R[2]), 'y, 'x)), Q)), c));
    zeta = 0,
    \\ o > 2
    if (T != polcyclo(o, 't), fx_err("Q(chi) is not Q[t]/polcyclo(o)"));
    if (poldegree(F[i], 'y) == 1,
      P = subst(T, 't, 'y); a = Mod('y, P); kk = 0; my(r = -polcoef(liftall(F[i]), 0, 'y));
      c = vector(B, n, lift(subst(subst(liftall(v[n + 1]), 'y, r), 't, a))),
      my(R = rnfequation(nfinit(T), liftall(F[i]), 1));
      P = R[1]; a = R[2]; kk = R[3];
      c = vector(B, n, lift(subst(subst(liftall(v[n + 1]), 'y, Mod('y, P) - kk * a), 't, a))));
    my(S = polredbest(P, 1), b = lift(S[2]));
    Q = subst(S[1], 'y, 'x);
    c = apply(z -> lift(Mod(subst(lift(z), 'y, subst(b, 'y, 'x)), Q)), c);
    zeta = lift(Mod(subst(lift(a), 'y, subst(b, 'y, 'x)), Q));
    note = Str(if (poldegree(F[i], 'y) == 1, "K = Q(chi) = Q[y]/(", "K = Q(chi)(y)/(mffields) = Q[y]/("), Str(P),
                if (poldegree(F[i], 'y) == 1, "), y = t", Str(") by rnfequation, root y + ", kk, "*t")),
                "; field = polredbest of it, y = ", Str(subst(b, 'y, 'x))));
  if (Q != 0 && (!fx_is_monic_integral(Q) || !polisirreducible(Q)), fx_err("field polynomial"));
  if (o > 2 && Mod(subst(polcyclo(o), 'x, zeta), Q) != 0, fx_err("zeta is not a primitive root of unity"));
  [IDFMT(N, k, o, i), N, k, Q, c, note, ch_cell(G, chi), zeta, o, G, chi];
}

\\ Hecke relations with the character (Diamond-Shurman Prop. 5.8.5 with chi): returns 1 when they hold with the given zeta.
ch_hecke_ok(r, zeta) =
{
  my(N = r[2], k = r[3], Q = r[4], c = r[5], G = r[10], chi = r[11], o = r[9], a);
  a = if (Q == 0, c, apply(t -> Mod(t, Q), c));
  if (a[1] != 1, return(0));
  for (m = 2, B, for (n = m + 1, B \ m, if (gcd(m, n) == 1 && a[m * n] != a[m] * a[n], return(0))));
  forprime (p = 2, B, my(q = p, x = ch_value(G, chi, o, p, zeta, if (Q == 0, 'x, Q)));
    while (q * p <= B,
      my(prev = if (q == p, 1, a[q / p]));
      if (a[q * p] != a[p] * a[q] - x * p^(k - 1) * prev, return(0));
      q *= p));
  1;
}

ch_dataset(dir, script, lines) =
{
  my(forms = vector(#SPECS, s, ch_form(SPECS[s][1], SPECS[s][2], SPECS[s][3], SPECS[s][4])), f);
  system(Str("mkdir -p ", dir));
  for (s = 1, #forms, my(r = forms[s]);
    if (!ch_hecke_ok(r, r[8]), fx_err(Str(r[1], ": Hecke relations with chi fail for zeta = image of t")));
    if (r[9] > 2 && ch_hecke_ok(r, lift(Mod(r[8], r[4])^-1)), fx_err(Str(r[1], ": the relations do not tell zeta from its inverse"))));
  f = fileopen(Str(dir, "/forms.csv"), "w");
  fx_header(f, script, concat(lines, ["newforms with character: row = i-th form of mfeigenbasis(mfinit([N,k,[G,chi]],0)), G = znstar(N,1)",
    "character = G.gen[j]:chi[j]/G.cyc[j] joined by ';' (PARI: chi(G.gen[j]) = exp(2 pi i chi[j]/G.cyc[j]))",
    "field: absolute field of Q(chi)(a_n), see fixtures-gp/characters.gp; zeta = image of PARI's t (Q(chi) = Q[t]/polcyclo(o,t)), empty when o <= 2",
    Str("specs [N,k,chi,i]: ", SPECS)]));
  for (s = 1, #forms, if (forms[s][6] != "", filewrite(f, Str("# ", forms[s][1], ": ", forms[s][6]))));
  filewrite(f, "id,level,weight,character,field,zeta");
  for (s = 1, #forms, my(r = forms[s]);
    filewrite(f, Str(r[1], ",", r[2], ",", r[3], ",", r[7], ",", if (r[4] == 0, "", fx_fmt(r[4])), ",", if (r[9] > 2, fx_fmt(r[8]), ""))));
  fileclose(f);
  f = fileopen(Str(dir, "/coefficients.csv"), "w");
  fx_header(f, script, [Str("value = a_n, n <= ", B, ", from mfcoefs(mfeigenbasis(mf)[i], B) written in the absolute field (see forms.csv)")]);
  filewrite(f, "form,n,value");
  for (s = 1, #forms, my(r = forms[s]);
    for (n = 1, B, filewrite(f, Str(r[1], ",", n, ",", fx_fmt(r[5][n])))));
  fileclose(f);
  for (s = 1, #forms, print(forms[s][1], " ", forms[s][7], " field ", forms[s][4], " zeta ", forms[s][8]));
  print(script, ": ok");
}
