default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/weight2: every newform orbit of S_2^new(Gamma0(N)),
\\ N in {11, 23, 37, 43, 63, 64, 67, 80, 125, 389}, with a_n for n <= 300.
read("fixtures-gp/lib.gp");
{
  my(forms = fx_spaces_dataset("plugin/src/test/resources/datasets/weight2", "weight2",
    [[11, 2], [23, 2], [37, 2], [43, 2], [63, 2], [64, 2], [67, 2], [80, 2], [125, 2], [389, 2]], 300, 0,
    ["weight 2, trivial character; a_n for 1 <= n <= 300"]), E);
  \\ independent check: lev11_wt2_o1 against the curve y^2 + y = x^3 - x^2 - 10x - 20 of conductor 11
  E = ellinit([0, -1, 1, -10, -20]);
  if (ellglobalred(E)[1] != 11 || forms[1][1] != "lev11_wt2_o1" || forms[1][5] != ellan(E, 300), fx_err("level 11 against ellan"));
  print("weight2: ok");
}
quit;
