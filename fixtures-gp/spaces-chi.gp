default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/spaces-chi: every newform orbit of S_k^new(N, chi) for six spaces with a
\\ character (orders 2, 3, 4, 6; odd weights; two generators), a_n for n <= 100, plus the weight-1 form of level 23.
\\ Orbit o2 of S_4^new(13, chi of order 3) is written with the conjugate character (and zeta^-1): the gate must see
\\ it as a form of the same space.
read("fixtures-gp/lib.gp");
dir = "plugin/src/test/resources/datasets/spaces-chi"; script = "spaces-chi"; B = 100;
cell(G,chi)={my(g=G.gen,s=""); if(charorder(G,chi)==1,return("1")); for(i=1,#g, my(v=chareval(G,chi,lift(g[i]))); s=concat(s,Str(if(i>1,";",""),lift(g[i]),":",numerator(v),"/",denominator(v)))); s};
\\ [N, k, Conrey label of chi, orbits written with the conjugate character]
S = [[13,4,3,[2]], [16,3,3,[]], [7,3,6,[]], [13,2,4,[]], [21,2,5,[]], [31,2,5,[]]];
forms = List(); spaces = List();
{
for (s = 1, #S, my([N, k, a, conj] = S[s], G = znstar(N,1), chi = znconreychar(G,a), m = charorder(G,chi),
     mf = mfinit([N,k,Mod(a,N)],0), E = mfeigenbasis(mf), F = mffields(mf), degsum = 0, tr = vector(B));
  listput(spaces, [N, k, cell(G,chi)]);
  for (i = 1, #E, my(P = F[i], v = mfcoefs(E[i], B), Pabs, ay, yrel, vals, z = "", id = Str("chi", N, "_wt", k, "_o", i), c = chi);
    if (m <= 2,
      Pabs = if (poldegree(P) == 1, 0, subst(P, 'y, 'x));
      vals = vector(B, n, my(w = liftall(v[n+1])); if (Pabs == 0, w, Mod(subst(w, 'y, 'x), Pabs)));
    ,
      my(R = rnfequation(polcyclo(m,'t), liftall(P), 1));
      Pabs = subst(R[1], 'y, 'x); ay = subst(lift(R[2]), 'y, 'x); yrel = 'x - R[3]*ay;
      if (!fx_is_monic_integral(Pabs), fx_err(Str(id, ": absolute polynomial not monic integral")));
      vals = vector(B, n, my(w = subst(liftall(v[n+1]), 'y, 'Y)); Mod(subst(subst(w, 't, ay), 'Y, yrel), Pabs));
      \\ zeta: the power of t with chi(p) = zeta^(m*chareval(chi,p)) in a_p^2 - a_{p^2} = chi(p) p^(k-1)
      for (j = 1, m, if (gcd(j, m) != 1, next); my(ok = 1, zz = Mod(ay, Pabs)^j);
        forprime (p = 2, 10, if (N % p == 0, next);
          if (vals[p]^2 - vals[p^2] != zz^(m*chareval(G,chi,p)) * p^(k-1), ok = 0));
        if (ok, z = zz; break));
      if (z == "", fx_err(Str(id, ": no zeta")));
      if (#select(x -> x == i, conj), c = charconj(G, chi); z = z^-1));
    degsum += if (Pabs == 0, 1, poldegree(Pabs));
    for (n = 1, B, tr[n] += if (Pabs == 0, vals[n], trace(vals[n])));
    listput(forms, [id, N, k, cell(G,c), Pabs, vals, if (z == "", "", fx_fmt(lift(z)))]));
  \\ checks: degrees add up to [Q(chi):Q] dim, traces to the orbit trace of the new trace form
  if (degsum != eulerphi(m) * mfdim([N,k,Mod(a,N)],0), fx_err(Str("degrees ", N, " ", k)));
  my(w = mfcoefs(mftraceform([N,k,Mod(a,N)],0), B));
  for (n = 1, B, if (tr[n] != if (type(w[n+1]) == "t_POLMOD", trace(w[n+1]), eulerphi(m)*w[n+1]), fx_err(Str("trace ", N, " ", k, " n=", n)))));
\\ weight 1: the dihedral form of level 23 (rational coefficients); its space row gets notes, never a pass
my(G = znstar(23,1), E = mfeigenbasis(mfinit([23,1,Mod(22,23)],0)));
if (#E != 1, fx_err("weight 1, level 23: expected one newform"));
listput(forms, [Str("chi23_wt1_o1"), 23, 1, cell(G, znconreychar(G, 22)), 0, vector(B, n, mfcoefs(E[1], B)[n+1]), ""]);
listput(spaces, [23, 1, cell(G, znconreychar(G, 22))]);
}
lines = ["a_n for 1 <= n <= 100; newforms of S_k^new(N,chi) from mfeigenbasis(mfinit([N,k,chi],0)), id chi<N>_wt<k>_o<i>", "checked: field degrees add up to [Q(chi):Q]*mfdim and traces to trace(mftraceform([N,k,chi],0)) for n <= 100"];
{
my(f = fileopen(Str(dir, "/forms.csv"), "w"));
fx_header(f, script, concat(lines, ["field = rnfequation(polcyclo(m), mffields(mf)[i], 1)[1] (x = y + k*t); zeta = the image of t^j with a_p^2 - a_{p^2} = chi(p) p^(k-1)",
  "chi13_wt4_o2 is written with the conjugate character and zeta^-1 (the same Galois orbit of forms)"]));
filewrite(f, "id,level,weight,character,field,zeta");
for (i = 1, #forms, my(r = forms[i]);
  filewrite(f, Str(r[1], ",", r[2], ",", r[3], ",", r[4], ",", if (r[5] == 0, "", fx_fmt(r[5])), ",", r[7])));
fileclose(f);
f = fileopen(Str(dir, "/coefficients.csv"), "w");
fx_header(f, script, concat(lines, ["value = the coefficient rewritten in the absolute field, reduced mod the field polynomial"]));
filewrite(f, "form,n,value");
for (i = 1, #forms, my(r = forms[i]); for (n = 1, B, filewrite(f, Str(r[1], ",", n, ",", fx_fmt(r[6][n])))));
fileclose(f);
f = fileopen(Str(dir, "/spaces.csv"), "w");
fx_header(f, script, ["every newform orbit of S_k^new(N,chi') for every chi' Galois-conjugate to chi is in forms.csv (checked against mfdim and mftraceform); weight 1: no dimension formula"]);
filewrite(f, "level,weight,character");
for (i = 1, #spaces, filewrite(f, Str(spaces[i][1], ",", spaces[i][2], ",", spaces[i][3])));
fileclose(f);
}
