\\ a_l for primes l <= 115000 of the weight-2 newforms of levels 11 and 58 attached to the curves
\\ E11: y^2 + y = x^3 - x^2 - 10x - 20 and E58: y^2 - 3xy - 4y = x^3 - 4x^2 (Tate normal form with b = c = 4,
\\ which has a rational point of order 5). Run: gp -q gp/level11-58.gp > level11-58.csv
E11 = ellinit([0,-1,1,-10,-20]); E58 = ellinit([-3,-4,-4,0,0]);
print("# a_l, l prime <= 115000, of the newforms of weight 2 and levels 11 (f11) and 58 (f58)");
print("# Computed with PARI/GP 2.15 (Debian package pari-gp): gp -q gp/level11-58.gp > level11-58.csv, where the script is");
print("#   E11=ellinit([0,-1,1,-10,-20]); E58=ellinit([-3,-4,-4,0,0]);");
print("#   forprime(l=2,115000,print(\"f11,\",l,\",\",ellap(E11,l))); forprime(l=2,115000,print(\"f58,\",l,\",\",ellap(E58,l)))");
print("# Conductors (ellglobalred): ", ellglobalred(E11)[1], " and ", ellglobalred(E58)[1], "; torsion orders (elltors): ", elltors(E11)[1], " and ", elltors(E58)[1]);
print("form,n,value");
forprime(l=2,115000,print("f11,",l,",",ellap(E11,l)));
forprime(l=2,115000,print("f58,",l,",",ellap(E58,l)));
