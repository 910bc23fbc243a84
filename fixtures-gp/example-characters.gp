default(parisizemax, 2^30)
\\ Dataset example-project/nebentypus: the example project's second scenario, "a group tabulating newforms with a
\\ nebentypus of small prime level, for a study of CM forms and of weight one": one orbit each of S_2(13, chi) (chi of
\\ order 6), S_2(17, chi) (order 8), S_3(11, chi) (order 10), S_3(7, (-7/.)) (CM, odd weight) and the dihedral weight-1
\\ forms of levels 23 and 31; a_n for n <= 60. Conventions (character cell, field, zeta) as in characters.gp.
\\ Ids are this scenario's own: neb<N>k<k>o<order>.
read("fixtures-gp/lib.gp");
read("fixtures-gp/lib-characters.gp");

SPECS = [[13, 2, [2], 1], [17, 2, [2], 1], [11, 3, [1], 1], [7, 3, [3], 1], [23, 1, [11], 1], [31, 1, [15], 1]];
B = 60;
IDFMT(N, k, o, i) = Str("neb", N, "k", k, "o", o);

ch_dataset("example-project/nebentypus", "example-characters", ["example project, second scenario; id neb<N>k<k>o<order>"]);
quit;
