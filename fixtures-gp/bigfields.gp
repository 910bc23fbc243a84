default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/bigfields: every newform orbit of S_2^new(Gamma0(389))
\\ (orbit degrees 1,2,3,6,20), S_2^new(Gamma0(331)) (1,3,7,16), S_4^new(Gamma0(43)) (4,6) and
\\ S_12^new(Gamma0(13)) (5,6), a_n for n <= 100. Field polynomials replaced by polredbest(P,1),
\\ coefficients rewritten exactly in the new generator (see fx_space in lib.gp).
read("fixtures-gp/lib.gp");
{
  fx_spaces_dataset("plugin/src/test/resources/datasets/bigfields", "bigfields",
    [[389, 2], [331, 2], [43, 4], [13, 12]], 100, 1,
    ["trivial character; a_n for 1 <= n <= 100; field polynomials reduced with polredbest(P,1)"]);
  print("bigfields: ok");
}
quit;
