default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/report-demo: what the HTML report draws. Every orbit of
\\ S_2^new(Gamma0(N)) for N in {11, 32, 23}: level 32 is a form with complex multiplication by Q(i)
\\ (a_p = 0 for every p = 3 mod 4), level 23 has a quadratic field with two real embeddings; a_n for n <= 150.
read("fixtures-gp/lib.gp");
DIR = "plugin/src/test/resources/datasets/report-demo";
SCRIPT = "report-demo";
{
  fx_spaces_dataset(DIR, SCRIPT, [[11, 2], [32, 2], [23, 2]], 150, 0,
    ["true values computed with PARI/GP for the HTML report's tests; a_n for 1 <= n <= 150"]);
  print("report-demo: ok");
}
quit;
