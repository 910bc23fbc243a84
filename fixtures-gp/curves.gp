default(parisizemax, 2^30);
\\ Datasets of rational weight-2 newforms with their elliptic curves (issue: curves beside forms).
\\ Run from the repository root:  gp -q fixtures-gp/curves.gp
\\ Writes plugin/src/test/resources/datasets/curves/ (everything right) and
\\ plugin/src/test/resources/datasets/curves-planted/ (one planted error per form).
\\ Models come from pari-elldata (ellsearch); the database's names are used only to group curves by
\\ isogeny class and are never written: form ids are f<N>_<k>, k = 1 + the class's position.
read("fixtures-gp/lib.gp");
B = 500;
cv(a) = Str("\"[", a[1], ",", a[2], ",", a[3], ",", a[4], ",", a[5], "]\"");
mod5(E) = vector(5, i, E[i]);
\\ [N, classes (0-based positions; [] = all), all curves of the class (1) or only the first (0)]
{picks = [[11, [], 1], [14, [0], 1], [15, [0], 1], [19, [0], 1], [26, [0], 1], [27, [], 1], [30, [0], 1],
         [32, [], 1], [36, [], 1], [37, [], 1], [48, [], 1], [54, [1], 1], [64, [], 1], [90, [2], 1], [96, [], 1],
         [108, [], 1], [128, [], 0], [144, [], 0], [210, [4], 1], [243, [], 0], [256, [], 0], [389, [], 0],
         [768, [0, 1], 0], [972, [0, 1], 0], [5077, [], 0]];}
\\ non-minimal models, written after the class's minimal ones: [N, class, change [1/u, r, s, t]]
{scaled = [[11, 0, [1/2, 1, -1, 3]], [11, 0, [1/6, -2, 1, 5]], [27, 0, [1/6, 1, 1, 1]], [32, 0, [1/2, 3, 1, -2]],
          [243, 0, [1/6, 0, 1, 0]], [256, 0, [1/2, 1, 1, 1]], [5077, 0, [1/6, 2, -1, 4]]];}
forms = List(); curves = List();
{
  for (i = 1, #picks, my(N = picks[i][1], want = picks[i][2], all = picks[i][3], L = ellsearch(N), byclass = Map());
    for (j = 1, #L, my(c = ellconvertname(L[j][1])[2]);
      if (#want && !setsearch(Set(want), c), next);
      my(v = if (mapisdefined(byclass, c), mapget(byclass, c), List()));
      listput(v, L[j][2]); mapput(byclass, c, v));
    my(keys = Mat(byclass)[, 1]~);
    for (t = 1, #keys, my(c = keys[t], v = mapget(byclass, c), id = Str("f", N, "_", c + 1), E = ellinit(v[1]));
      if (ellglobalred(E)[1] != N, fx_err("conductor"));
      listput(forms, [id, N, 2, 0, ellan(E, B), ""]);
      for (j = 1, if (all, #v, 1), listput(curves, [id, v[j], elltors(ellinit(v[j]))[1]]));
      for (s = 1, #scaled, if (scaled[s][1] == N && scaled[s][2] == c,
        my(a = mod5(ellchangecurve(E, scaled[s][3])));
        if (ellan(ellminimalmodel(ellinit(a)), B) != ellan(E, B), fx_err("scaled model"));
        listput(curves, [id, a, elltors(ellinit(a))[1]])))));
}
forms = Vec(forms); curves = Vec(curves);
for (i = 1, #forms, fx_check_hecke(forms[i]));
{write_dataset(dir, fs, cs, notes) =
    system(Str("mkdir -p ", dir, "; rm -f ", dir, "/*.csv"));
    my(f = fileopen(Str(dir, "/forms.csv"), "w"));
    fx_header(f, "curves", concat(["rational newforms of weight 2 and level N, one per isogeny class of conductor N (modularity); id f<N>_<k> (our own numbering)"], notes));
    filewrite(f, "id,level,weight,character,field");
    for (i = 1, #fs, filewrite(f, Str(fs[i][1], ",", fs[i][2], ",2,,")));
    fileclose(f);
    f = fileopen(Str(dir, "/coefficients.csv"), "w");
    fx_header(f, "curves", [Str("value = ellan(ellinit(a), ", B, ")[n] for the first model a of the form's class in curves.csv")]);
    filewrite(f, "form,n,value");
    for (i = 1, #fs, for (n = 1, #fs[i][5], filewrite(f, Str(fs[i][1], ",", n, ",", fs[i][5][n]))));
    fileclose(f);
    f = fileopen(Str(dir, "/curves.csv"), "w");
    fx_header(f, "curves", concat(["curve = coefficients of a model from ellsearch(N) (pari-elldata), or ellchangecurve(E, [1/u, r, s, t]) of one (u = 2 or 6: not minimal); torsion = elltors(ellinit(curve))[1]"], notes));
    filewrite(f, "form,curve,torsion");
    for (i = 1, #cs, filewrite(f, Str(cs[i][1], ",", cv(cs[i][2]), ",", cs[i][3])));
    fileclose(f);
}
write_dataset("plugin/src/test/resources/datasets/curves", forms, curves, []);
print("curves: ", #forms, " forms, ", #curves, " curves");

\\ planted errors, one per form
fid(id) = for (i = 1, #forms, if (forms[i][1] == id, return(forms[i]))); fx_err(id);
E11 = ellinit([0,-1,1,-10,-20]);
T11 = mod5(ellminimalmodel(ellinit(elltwist(E11, -4))));
E37b = [0,1,1,-23,-50];
E5077 = [0,0,1,-7,6];
{notes = [Str("planted: f11_1 has the twist by -4 of its curve: ", cv(T11), " = ellminimalmodel(ellinit(elltwist(E, -4))), conductor ", ellglobalred(ellinit(T11))[1], ", a_p = kronecker(-4, p) * a_p(E); ellap(ellinit(T11), 3) = ", ellap(ellinit(T11), 3), ", ellap(E, 3) = ", ellap(E11, 3)),
         Str("planted: f37_1 has the curve [0,1,1,-23,-50] of the other class of conductor 37: ellap at 2 = ", ellap(ellinit(E37b), 2), " against ", fid("f37_1")[5][2]),
         Str("planted: f5077_1 has torsion 3, elltors gives ", elltors(ellinit(E5077))[1]),
         "planted: f27_1 has the singular cubic [0,0,0,-3,2] (x^3 - 3x + 2 = (x - 1)^2 (x + 2)), disc 0"];}
planted = [fid("f11_1"), fid("f37_1"), fid("f5077_1"), fid("f27_1")];
pc = [["f11_1", T11, 1], ["f37_1", E37b, 3], ["f5077_1", E5077, 3], ["f27_1", [0,0,0,-3,2], 1]];
write_dataset("plugin/src/test/resources/datasets/curves-planted", planted, pc, notes);
print(notes);
