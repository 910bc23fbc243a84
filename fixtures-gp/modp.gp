default(parisizemax, 2^30)
\\ Dataset plugin/src/test/resources/datasets/modp: forms for the mod-p weight tests, a_n for n <= 200,
\\ facts.csv: for each form, each prime 5 <= p <= 97 with p not dividing N and k <= p+1, and each
\\ prime above p named by a factor of the field polynomial mod p, whether a_p = 0 mod that prime.
\\ companions.csv repeats the companion-form congruences of datasets/congruences.
read("fixtures-gp/lib.gp");
DIR = "plugin/src/test/resources/datasets/modp";
SCRIPT = "modp";
BOUND = 200;
PMAX = 97;
WANT = [[1,12,1], [1,16,1], [1,18,1], [1,24,1], [11,2,1], [37,2,1], [37,2,2], [23,2,1], [43,2,1], [51,2,1], [51,6,4], [57,2,2], [57,10,1], [32,2,1], [32,12,2], [21,2,1], [21,4,2], [27,2,1], [27,6,1]];
COMP = [\
 ["lev51_wt6_o4", "lev51_wt2_o1", 7, 5, x, 0],\
 ["lev57_wt10_o1", "lev57_wt2_o2", 11, 9, x + 1, 0],\
 ["lev32_wt12_o2", "lev32_wt2_o1", 13, 11, x + 6, 0],\
 ["lev21_wt4_o2", "lev21_wt2_o1", 5, 3, 0, 0],\
 ["lev27_wt6_o1", "lev27_wt2_o1", 7, 5, 0, 0]];
{
  my(forms = fx_pick(WANT, BOUND), facts = List(), skipped = List(), fh, lines);
  system(Str("mkdir -p ", DIR));
  for (t = 1, #forms, fx_check_hecke(forms[t]));
  lines = ["forms for mod-p weight tests (level 1, weight 2, companion pairs of datasets/congruences); a_n for n <= 200"];
  fx_write_forms(DIR, SCRIPT, forms, lines);
  fx_write_coeffs(DIR, SCRIPT, forms, lines);
  fx_check_files(DIR, forms);
  for (t = 1, #forms, my(r = forms[t]);
    forprime (p = 5, PMAX, if (r[2] % p == 0 || r[3] > p + 1, next);
      my(qs = if (r[4] == 0, [0], apply(lift, factormod(r[4], p)[, 1]~)));
      if (r[4] != 0 && !fx_p_maximal(r[4], p), listput(skipped, Str(r[1], " at p = ", p, " (p divides the index of Z[x])")); next);
      for (s = 1, #qs, listput(facts, [r[1], p, fx_red(r, p, p, qs[s]) == 0, qs[s]]))));
  \\ sanity checks against known values (a_19 = a_29 = 0 for the level-11 form; tau(p) != 0 mod p)
  for (t = 1, #facts, my(f = facts[t]);
    if (f[1] == "lev11_wt2_o1" && (f[2] == 19 || f[2] == 29) && !f[3], fx_err("level 11 at 19/29"));
    if (f[1] == "lev1_wt12_o1" && f[3], fx_err("tau(p) = 0 mod p")));
  for (t = 1, #COMP, my(c = COMP[t], a = fx_find(forms, c[1]), b = fx_find(forms, c[2]));
    fx_check_prime(a, c[3], c[5]);
    if (fx_cong_first_failure(a, b, c[3], c[4], c[5], c[6], BOUND) != 0, fx_err("companion")));
  fh = fileopen(Str(DIR, "/facts.csv"), "w");
  fx_header(fh, SCRIPT, concat(["ap_mod_p_zero = (a_p = 0 mod the prime above p), i.e. f is supersingular (non-ordinary) at that prime; computed in gp from mfcoefs",
    "rows: every form of forms.csv, every prime 5 <= p <= 97 with p not dividing N and weight <= p+1, every prime above p (factor of the field polynomial mod p)"],
    if (#skipped, concat(["skipped:"], Vec(skipped)), [])));
  filewrite(fh, "form,p,ap_mod_p_zero,prime");
  for (t = 1, #facts, my(f = facts[t]); filewrite(fh, Str(f[1], ",", f[2], ",", if (f[3], "true", "false"), ",", fx_qstr(f[4]))));
  fileclose(fh);
  fh = fileopen(Str(DIR, "/companions.csv"), "w");
  fx_header(fh, SCRIPT, ["companion pairs (weights p-1 and 2, twist p-2; Gross, Duke Math. J. 61 (1990)), same rows as in datasets/congruences/congruences.csv,",
    "same columns and meaning: a_l(form) = l^twist a_l(other) mod the prime, every prime l not dividing p N; checked here for l <= 200 and there for l <= 5000"]);
  filewrite(fh, "form,other,p,twist,prime,other_prime");
  for (t = 1, #COMP, my(c = COMP[t]); filewrite(fh, Str(c[1], ",", c[2], ",", c[3], ",", c[4], ",", fx_qstr(c[5]), ",", fx_qstr(c[6]))));
  fileclose(fh);
  print("modp: ok, ", #facts, " facts, ", #[f | f <- Vec(facts), f[3]], " supersingular");
}
quit;
