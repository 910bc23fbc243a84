\\ The level-23 orbit written with the other root: a_l(1 - x) for a_l(x) of level23.csv (same field x^2 - x - 1,
\\ since 1 - x is the conjugate of x). Run: gp -q gp/level23-conjugate.gp > level23-conjugate.csv
mf = mfinit([23,2],0); F = mfeigenbasis(mf)[1]; v = mfcoefs(F, 100);
print("# a_l, l prime <= 100, of the level-23 orbit written with the conjugate root (lev23c): a_l(1 - x)");
print("# Computed with PARI/GP 2.15 (Debian package pari-gp): gp -q gp/level23-conjugate.gp > level23-conjugate.csv, where");
print("#   mf=mfinit([23,2],0); F=mfeigenbasis(mf)[1]; v=mfcoefs(F,100);");
print("#   forprime(l=2,100,print(\"lev23c,\",l,\",\",subst(lift(v[l+1]),y,1-x)))");
print("form,n,value");
forprime(l=2,100,print("lev23c,",l,",",subst(lift(v[l+1]),y,1-x)));
