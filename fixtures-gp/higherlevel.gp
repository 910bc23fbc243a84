default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/higherlevel: every newform orbit of S_k^new(Gamma0(N)),
\\ (N,k) in {(2,8),(3,6),(5,4),(7,4),(11,4),(13,2),(15,4),(24,4),(49,2),(27,2)}, a_n for n <= 150.
read("fixtures-gp/lib.gp");
{
  fx_spaces_dataset("plugin/src/test/resources/datasets/higherlevel", "higherlevel",
    [[2, 8], [3, 6], [5, 4], [7, 4], [11, 4], [13, 2], [15, 4], [24, 4], [49, 2], [27, 2]], 150, 0,
    ["trivial character; a_n for 1 <= n <= 150",
     "S_2^new(Gamma0(13)) = 0 (X_0(13) has genus 0): listed in spaces.csv, no forms"]);
  print("higherlevel: ok");
}
quit;
