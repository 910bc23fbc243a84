default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/bigcharacter: the 3rd newform orbit of S_2(67, chi), chi of order 11
\\ (relative degree 2 over Q(chi) = Q(zeta_11), absolute degree 20, a CM field), a_n for n <= 100: the benchmark of
\\ Ramanujan-Petersson with a character (docs/benchmarks.md) and a real-data test. Conventions as in characters.gp.
read("fixtures-gp/lib.gp");
read("fixtures-gp/lib-characters.gp");

SPECS = [[67, 2, [6], 3]];
B = 100;
IDFMT(N, k, o, i) = Str("lev", N, "_wt", k, "_chi", o, "_o", i);

ch_dataset("plugin/src/test/resources/datasets/bigcharacter", "bigcharacter", ["id lev<N>_wt<k>_chi<order>_o<i>"]);
quit;
