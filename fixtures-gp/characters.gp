default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/characters: newforms with a nontrivial character (nebentypus),
\\ a_n for n <= B, one orbit per row of SPECS below.
\\   SPECS entry [N, k, chi, i]: the i-th form of mfeigenbasis(mfinit([N, k, [znstar(N,1), chi]], 0)),
\\   chi in PARI's coordinates on the generators G.gen of G = znstar(N, 1): chi(G.gen[j]) = exp(2 pi i chi[j]/G.cyc[j]).
\\ Our character cell is "G.gen[1]:chi[1]/G.cyc[1];G.gen[2]:chi[2]/G.cyc[2]..." (same meaning).
\\ Coefficient field: PARI gives a_n in the relative field Q(chi)(y)/(mffields(mf)[i]) over Q(chi) = Q[t]/(T),
\\ T = mfparams(mf)[5] = polcyclo(o, t) for the order o > 2 (t + 1 for o <= 2). The absolute field is
\\ rnfequation(nfinit(T), mffields(mf)[i], 1) = [P, a, kk]: the root is y + kk*t, and t = a; it is then reduced
\\ by polredbest(P, 1) = [Q, b] (y = b(x)); zeta = the image of t, a primitive o-th root of unity.
\\ The choice "zeta = image of t" is checked below: the Hecke recursion
\\ a_{p^{r+1}} = a_p a_{p^r} - chi(p) p^{k-1} a_{p^{r-1}} with chi(p) = zeta^(o * chareval(G, chi, p)) holds for every p^{r+1} <= B,
\\ and fails with zeta^-1 (so a wrong zeta would be caught); and polcyclo(o)(zeta) = 0.
read("fixtures-gp/lib.gp");
read("fixtures-gp/lib-characters.gp");

SPECS = [[13, 2, [2], 1], [7, 4, [2], 1], [9, 4, [2], 1], [13, 3, [3], 1], [10, 3, [1], 1], [21, 2, [1, 1], 1], [17, 2, [2], 1], [7, 3, [3], 1], [23, 1, [11], 1], [31, 1, [15], 1], [20, 3, [1, 0], 1], [20, 2, [1, 1], 1], [28, 2, [2, 0], 1], [13, 8, [2], 1]];
B = 150;
IDFMT(N, k, o, i) = Str("lev", N, "_wt", k, "_chi", o, "_o", i);

ch_dataset("plugin/src/test/resources/datasets/characters", "characters", ["id lev<N>_wt<k>_chi<order>_o<i>"]);
quit;
