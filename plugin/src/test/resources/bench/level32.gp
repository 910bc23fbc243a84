\\ a_n, n <= 2000, of the elliptic curve y^2 = x^3 - x (conductor 32), i.e. of the weight-2 newform of level 32.
\\ Run from the repository root:  gp -q plugin/src/test/resources/bench/level32.gp > plugin/src/test/resources/bench/level32.csv
E = ellinit([-1, 0]);
print("# a_n of y^2 = x^3 - x, PARI/GP 2.15.2: gp -q plugin/src/test/resources/bench/level32.gp (ellan(ellinit([-1,0]),2000)); ellglobalred(E)[1] = ", ellglobalred(E)[1]);
print("n,a_n");
v = ellan(E, 2000);
for (n = 1, #v, print(n, ",", v[n]));
