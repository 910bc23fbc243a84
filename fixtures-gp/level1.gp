default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/level1: every newform of S_k(SL_2(Z)),
\\ k = 12, 16, 18, 20, 22, 24, 26, 36, with a_n for n <= 200.
read("fixtures-gp/lib.gp");
{
  my(forms = fx_spaces_dataset("plugin/src/test/resources/datasets/level1", "level1",
    [[1, 12], [1, 16], [1, 18], [1, 20], [1, 22], [1, 24], [1, 26], [1, 36]], 200, 0,
    ["level 1: S_k(SL_2(Z)) is all new; a_n for 1 <= n <= 200"]), q = 'q, delta);
  \\ independent check of Delta = q prod (1 - q^n)^24
  delta = Vec(q * eta(q + O(q^201))^24);
  if (forms[1][1] != "lev1_wt12_o1" || forms[1][5] != delta[1..200], fx_err("Delta against the eta product"));
  print("level1: ok");
}
quit;
