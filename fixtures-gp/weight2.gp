default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/weight2: every newform orbit of S_2^new(Gamma0(N)),
\\ N in {11, 23, 37, 43, 63, 64, 67, 80, 125, 389}, with a_n for n <= 300.
read("fixtures-gp/lib.gp");
{
  fx_spaces_dataset("plugin/src/test/resources/datasets/weight2", "weight2",
    [[11, 2], [23, 2], [37, 2], [43, 2], [63, 2], [64, 2], [67, 2], [80, 2], [125, 2], [389, 2]], 300, 0,
    ["weight 2, trivial character; a_n for 1 <= n <= 300"]);
  print("weight2: ok");
}
quit;
