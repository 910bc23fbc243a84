default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/congruences: selected newforms (a_n, n <= 1000),
\\ congruences.csv / reducible.csv with TRUE claims and congruences-false.csv /
\\ reducible-false.csv with FALSE variants, each checked here for all primes l <= 5000.
\\ How the pairs were found (search loops kept in fixtures-gp/README.md):
\\  - different levels, weight 2: all rational newforms of level <= 200, pairs with
\\    a_l(f) = a_l(g) mod p (p = 3, 5, 7) for l <= 2000, l not dividing p N_f N_g,
\\    keeping pairs that are not a_l = 1 + l mod p;
\\  - different weights, same level N <= 60, p in {5,7,11,13}: rational weight-2 f against
\\    every orbit of weight p-1 and p+1 and every prime of degree 1 over p, twists 0..p-2;
\\  - level 1: all pairs of weights 12..36, 7 <= p <= 61, primes of degree 1, twists 0..p-2.
read("fixtures-gp/lib.gp");
DIR = "plugin/src/test/resources/datasets/congruences";
SCRIPT = "congruences";
BOUND = 1000;
CHECK = 5000;
\\ forms [N, k, i]
WANT = [[1,12,1], [1,16,1], [1,22,1], [1,24,1], [11,2,1], [11,4,1], [11,8,1], [77,2,1], [26,2,2], [182,2,5], [46,2,1], [115,2,1], [51,2,1], [51,6,4], [57,2,2], [57,10,1], [32,2,1], [32,12,2], [21,2,1], [21,4,2], [27,2,1], [27,6,1]];
\\ [form, other, p, twist, prime, other_prime, comment]; a_l(form) = l^twist a_l(other) mod the primes
CONG = [\
 ["lev77_wt2_o1", "lev11_wt2_o1", 3, 0, 0, 0, "(c) weight 2, levels 77 and 11 (level raising at 7: a_7(lev11_wt2_o1) = -2 = -(7+1) mod 3)"],\
 ["lev182_wt2_o5", "lev26_wt2_o2", 7, 0, 0, 0, "(c) weight 2, levels 182 and 26"],\
 ["lev115_wt2_o1", "lev46_wt2_o1", 5, 0, 0, 0, "(c) weight 2, levels 115 and 46"],\
 ["lev51_wt6_o4", "lev51_wt2_o1", 7, 5, x, 0, "(d) weights 6 = p-1 and 2, level 51, twist p-2 (companion forms, Gross, Duke Math. J. 61 (1990))"],\
 ["lev57_wt10_o1", "lev57_wt2_o2", 11, 9, x + 1, 0, "(d) weights 10 = p-1 and 2, level 57, twist p-2 (companion forms)"],\
 ["lev32_wt12_o2", "lev32_wt2_o1", 13, 11, x + 6, 0, "(d) weights 12 = p-1 and 2, level 32, twist p-2 (companion forms)"],\
 ["lev21_wt4_o2", "lev21_wt2_o1", 5, 3, 0, 0, "(d) weights 4 = p-1 and 2, level 21, twist p-2, both rational (companion forms)"],\
 ["lev27_wt6_o1", "lev27_wt2_o1", 7, 5, 0, 0, "(d) weights 6 = p-1 and 2, level 27, twist p-2, both rational; lev27_wt2_o1 has CM by Q(sqrt -3), 7 splits there"],\
 ["lev11_wt8_o1", "lev11_wt2_o1", 7, 0, x + 6, 0, "(d) weights 8 = p+1 and 2, level 11, no twist"],\
 ["lev11_wt4_o1", "lev11_wt2_o1", 3, 0, x, 0, "(d) weights 4 = p+1 and 2, level 11, no twist; (3, x) is ramified in Q(sqrt 3)"],\
 ["lev1_wt22_o1", "lev1_wt12_o1", 11, 0, 0, 0, "(e) level 1, weights 22 and 12"],\
 ["lev1_wt24_o1", "lev1_wt12_o1", 13, 0, x + 10, 0, "(e) level 1, weights 24 and 12"],\
 ["lev1_wt16_o1", "lev1_wt12_o1", 13, 2, 0, 0, "(e) level 1, weights 16 and 12, twist 2 (a_l(f_16) = l^2 tau(l) mod 13)"],\
 ["lev1_wt24_o1", "lev1_wt12_o1", 11, 1, x + 2, 0, "(e) level 1, weights 24 and 12, twist 1 (a_l = l tau(l) mod (11, x + 2))"],\
 ["lev1_wt12_o1", "lev11_wt2_o1", 11, 0, 0, 0, "level 1 weight 12 and level 11 weight 2 mod 11"]];
\\ [form, other, p, twist, prime, other_prime, comment] claims that must FAIL
CONGF = [\
 ["lev77_wt2_o1", "lev11_wt2_o1", 5, 0, 0, 0, "wrong p"],\
 ["lev182_wt2_o5", "lev26_wt2_o2", 7, 1, 0, 0, "wrong twist"],\
 ["lev115_wt2_o1", "lev46_wt2_o1", 3, 0, 0, 0, "wrong p"],\
 ["lev51_wt6_o4", "lev51_wt2_o1", 7, 0, x, 0, "twist 0 instead of p-2"],\
 ["lev57_wt10_o1", "lev57_wt2_o2", 11, 1, x + 1, 0, "twist 1 instead of p-2"],\
 ["lev32_wt12_o2", "lev32_wt2_o1", 13, 0, x + 6, 0, "twist 0 instead of p-2"],\
 ["lev21_wt4_o2", "lev21_wt2_o1", 5, 1, 0, 0, "twist 1 instead of p-2"],\
 ["lev27_wt6_o1", "lev27_wt2_o1", 7, 4, 0, 0, "twist 4 instead of p-2"],\
 ["lev11_wt8_o1", "lev11_wt2_o1", 7, 0, x + 1, 0, "the other prime above 7"],\
 ["lev11_wt4_o1", "lev11_wt2_o1", 3, 1, x, 0, "wrong twist"],\
 ["lev1_wt22_o1", "lev1_wt12_o1", 13, 0, 0, 0, "wrong p"],\
 ["lev1_wt24_o1", "lev1_wt12_o1", 13, 0, x + 2, 0, "the other prime above 13"],\
 ["lev1_wt16_o1", "lev1_wt12_o1", 13, 1, 0, 0, "twist 1 instead of 2"],\
 ["lev1_wt24_o1", "lev1_wt12_o1", 11, 1, x + 8, 0, "the other prime above 11"],\
 ["lev1_wt12_o1", "lev11_wt2_o1", 11, 1, 0, 0, "wrong twist"]];
\\ [form, p, i, j, prime, comment]: a_l = l^i + l^j mod the prime
RED = [\
 ["lev1_wt12_o1", 691, 0, 11, 0, "tau(n) = sigma_11(n) mod 691: Ramanujan 1916; Serre, Congruences et formes modulaires [d'apres H.P.F. Swinnerton-Dyer], Sem. Bourbaki 416 (from memory)"],\
 ["lev11_wt2_o1", 5, 0, 1, 0, "a_l = 1 + l mod 5 for l != 5, 11: Mazur, Modular curves and the Eisenstein ideal, 1977 (from memory)"],\
 ["lev1_wt12_o1", 2, 0, 11, 0, "p = 2: tau(l) even for odd l"],\
 ["lev1_wt12_o1", 7, 1, 4, 0, "tau(n) = n sigma_3(n) mod 7"],\
 ["lev1_wt16_o1", 3617, 0, 15, 0, "3617 divides the numerator of B_16"],\
 ["lev1_wt24_o1", 103, 0, 23, x + 40, "103 divides the numerator of B_24"]];
REDF = [\
 ["lev1_wt12_o1", 691, 0, 10, 0, "wrong j"],\
 ["lev11_wt2_o1", 5, 1, 1, 0, "wrong i"],\
 ["lev11_wt2_o1", 7, 0, 1, 0, "wrong p"],\
 ["lev1_wt12_o1", 7, 0, 11, 0, "wrong exponents mod 7"],\
 ["lev1_wt16_o1", 3617, 0, 14, 0, "wrong j"],\
 ["lev1_wt24_o1", 103, 0, 23, x + 62, "the other prime above 103"]];
{
  my(forms = fx_pick(WANT, CHECK), short, f, lines, fh, irr = List());
  system(Str("mkdir -p ", DIR));
  short = vector(#forms, t, fx_trunc(forms[t], BOUND));
  for (t = 1, #short, fx_check_hecke(short[t]));
  \\ CM check behind a comment below: a_l(lev27_wt2_o1) = 0 for every prime l = 2 mod 3
  forprime (l = 2, CHECK, if (l % 3 == 2 && fx_find(forms, "lev27_wt2_o1")[5][l] != 0, fx_err("CM of lev27_wt2_o1")));
  for (t = 1, #CONG, my(c = CONG[t], a = fx_find(forms, c[1]), b = fx_find(forms, c[2]), w);
    fx_check_prime(a, c[3], c[5]); fx_check_prime(b, c[3], c[6]);
    if (fx_cong_first_failure(a, b, c[3], c[4], c[5], c[6], CHECK) != 0, fx_err(Str("congruence ", t)));
    if (c[4] == 0 && c[5] == 0 && c[6] == 0 && fx_cong_first_failure(a, b, c[3], 0, 0, 0, CHECK) != 0, fx_err("?"));
    w = fx_irr_witness(if (a[4] == 0, a, b), c[3], CHECK);
    if (w == 0 && c[3] > 2, fx_err(Str("no irreducibility witness for congruence ", t)));
    listput(irr, Str(c[1], " ~ ", c[2], " mod ", c[3], ": residual representation irreducible, witness l = ", w,
      " (a_l^2 - 4 l^(k-1) is a non-square mod p)")));
  lines = ["forms of the claims in congruences.csv, reducible.csv and their FALSE variants; a_n for n <= 1000 (claims checked for primes l <= 5000)"];
  fx_write_forms(DIR, SCRIPT, short, lines);
  fx_write_coeffs(DIR, SCRIPT, short, lines);
  fx_check_files(DIR, short);

  fh = fileopen(Str(DIR, "/congruences.csv"), "w");
  fx_header(fh, SCRIPT, concat(["TRUE: a_l(form) = l^twist a_l(other) mod a prime above p for every prime l not dividing p N_form N_other, checked for all such l <= 5000",
    "prime/other_prime = factor of the form's field polynomial mod p naming that prime (p does not divide the index of Z[x], checked with nfdisc)",
    "found by search in gp; irreducibility of the residual representation:"], Vec(irr)));
  for (t = 1, #CONG, filewrite(fh, Str("# ", CONG[t][1], " ~ ", CONG[t][2], ": ", CONG[t][7])));
  filewrite(fh, "form,other,p,twist,prime,other_prime");
  for (t = 1, #CONG, my(c = CONG[t]); filewrite(fh, Str(c[1], ",", c[2], ",", c[3], ",", c[4], ",", fx_qstr(c[5]), ",", fx_qstr(c[6]))));
  fileclose(fh);

  fh = fileopen(Str(DIR, "/congruences-false.csv"), "w");
  fx_header(fh, SCRIPT, ["FALSE variants of congruences.csv: first_failure = the least prime l not dividing p N_form N_other with a_l(form) != l^twist a_l(other) mod the prime (computed in gp)"]);
  for (t = 1, #CONGF, filewrite(fh, Str("# ", CONGF[t][1], " ~ ", CONGF[t][2], ": ", CONGF[t][7])));
  filewrite(fh, "form,other,p,twist,prime,other_prime,first_failure");
  for (t = 1, #CONGF, my(c = CONGF[t], a = fx_find(forms, c[1]), b = fx_find(forms, c[2]), l);
    fx_check_prime(a, c[3], c[5]); fx_check_prime(b, c[3], c[6]);
    l = fx_cong_first_failure(a, b, c[3], c[4], c[5], c[6], CHECK);
    if (l == 0, fx_err(Str("false congruence ", t, " holds")));
    filewrite(fh, Str(c[1], ",", c[2], ",", c[3], ",", c[4], ",", fx_qstr(c[5]), ",", fx_qstr(c[6]), ",", l)));
  fileclose(fh);

  fh = fileopen(Str(DIR, "/reducible.csv"), "w");
  fx_header(fh, SCRIPT, ["TRUE: a_l(form) = l^i + l^j mod a prime above p for every prime l not dividing p N, checked for all such l <= 5000"]);
  for (t = 1, #RED, filewrite(fh, Str("# ", RED[t][1], " mod ", RED[t][2], ": ", RED[t][6])));
  filewrite(fh, "form,p,i,j,prime");
  for (t = 1, #RED, my(c = RED[t], a = fx_find(forms, c[1]));
    fx_check_prime(a, c[2], c[5]);
    if (fx_red_first_failure(a, c[2], c[3], c[4], c[5], CHECK) != 0, fx_err(Str("reducible ", t)));
    filewrite(fh, Str(c[1], ",", c[2], ",", c[3], ",", c[4], ",", fx_qstr(c[5]))));
  fileclose(fh);

  fh = fileopen(Str(DIR, "/reducible-false.csv"), "w");
  fx_header(fh, SCRIPT, ["FALSE variants of reducible.csv: first_failure = the least prime l not dividing p N with a_l != l^i + l^j mod the prime (computed in gp)"]);
  for (t = 1, #REDF, filewrite(fh, Str("# ", REDF[t][1], " mod ", REDF[t][2], ": ", REDF[t][6])));
  filewrite(fh, "form,p,i,j,prime,first_failure");
  for (t = 1, #REDF, my(c = REDF[t], a = fx_find(forms, c[1]), l);
    fx_check_prime(a, c[2], c[5]);
    l = fx_red_first_failure(a, c[2], c[3], c[4], c[5], CHECK);
    if (l == 0, fx_err(Str("false reducible ", t, " holds")));
    filewrite(fh, Str(c[1], ",", c[2], ",", c[3], ",", c[4], ",", fx_qstr(c[5]), ",", l)));
  fileclose(fh);
  print("congruences: ok");
}
quit;
