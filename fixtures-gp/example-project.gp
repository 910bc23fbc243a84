default(parisizemax, 2^30)
\\ Dataset example-project/data: tables of "a group preparing tables for a paper on newforms of
\\ small prime level": every orbit of S_2^new(Gamma0(N)), N in {11, 23, 29, 31}, of S_4^new(Gamma0(11))
\\ and of S_12(SL_2(Z)), a_n for n <= 100; one congruence and one Eisenstein congruence, both true
\\ (checked here for all primes l <= 5000; taken from datasets/congruences).
read("fixtures-gp/lib.gp");
DIR = "example-project/data";
SCRIPT = "example-project";
{
  my(spaces = [[11, 2], [23, 2], [29, 2], [31, 2], [11, 4], [1, 12]], forms, long, fh, d, e);
  forms = fx_spaces_dataset(DIR, SCRIPT, spaces, 100, 0,
    ["true values computed with PARI/GP for the example project; a_n for 1 <= n <= 100"]);
  long = fx_pick([[1, 12, 1], [11, 2, 1]], 5000);
  d = long[1]; e = long[2];
  if (fx_cong_first_failure(d, e, 11, 0, 0, 0, 5000) != 0, fx_err("congruence mod 11"));
  if (fx_red_first_failure(e, 5, 0, 1, 0, 5000) != 0, fx_err("Eisenstein congruence mod 5"));
  fh = fileopen(Str(DIR, "/congruences.csv"), "w");
  fx_header(fh, SCRIPT, ["TRUE: a_l(form) = l^twist a_l(other) mod p for every prime l not dividing p N_form N_other, checked in gp for l <= 5000",
    "(same row as in plugin/src/test/resources/datasets/congruences/congruences.csv)"]);
  filewrite(fh, "form,other,p,twist,prime,other_prime");
  filewrite(fh, "lev1_wt12_o1,lev11_wt2_o1,11,0,,");
  fileclose(fh);
  fh = fileopen(Str(DIR, "/reducible.csv"), "w");
  fx_header(fh, SCRIPT, ["TRUE: a_l = l^i + l^j mod p for every prime l not dividing p N, checked in gp for l <= 5000",
    "Mazur, Modular curves and the Eisenstein ideal, 1977 (from memory)"]);
  filewrite(fh, "form,p,i,j,prime");
  filewrite(fh, "lev11_wt2_o1,5,0,1,");
  fileclose(fh);
  print("example-project: ok");
}
quit;
