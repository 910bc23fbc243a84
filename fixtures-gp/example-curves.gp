default(parisizemax, 2^30);
\\ example-project/data/curves.csv: every curve of the isogeny class of each rational weight-2 form of
\\ example-project/data/forms.csv, found by matching ellan with the coefficients of the form.
\\ Run from the repository root:  gp -q fixtures-gp/example-curves.gp
read("fixtures-gp/lib.gp");
cv(a) = Str("\"[", a[1], ",", a[2], ",", a[3], ",", a[4], ",", a[5], "]\"");
{
  my(F = fx_rows("example-project/data/forms.csv"), C = fx_rows("example-project/data/coefficients.csv"),
     out = "example-project/data/curves.csv", f, rows = List());
  for (i = 1, #F, my(r = F[i]);
    if (eval(r[3]) != 2 || (#r >= 5 && r[5] != ""), next);
    my(id = r[1], N = eval(r[2]), a = [eval(c[3]) | c <- C, c[1] == id], L = ellsearch(N), n = 0);
    for (j = 1, #L, if (ellan(ellinit(L[j][2]), #a) == a,
      listput(rows, [id, L[j][2], elltors(ellinit(L[j][2]))[1]]); n++));
    if (n == 0, fx_err(Str("no curve for ", id))));
  f = fileopen(out, "w");
  fx_header(f, "example-curves", ["curve = a model from ellsearch(N) (pari-elldata) whose ellan equals the form's coefficients; torsion = elltors(ellinit(curve))[1]"]);
  filewrite(f, "form,curve,torsion");
  for (i = 1, #rows, filewrite(f, Str(rows[i][1], ",", cv(rows[i][2]), ",", rows[i][3])));
  fileclose(f);
  print(#rows, " curves");
}
