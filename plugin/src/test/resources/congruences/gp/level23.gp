\\ a_l for primes l <= 1200 of the newform orbit of level 23 and weight 2 (coefficient field Q[y]/(y^2 - y - 1),
\\ written in x). Run: gp -q gp/level23.gp > level23.csv
mf = mfinit([23,2],0); F = mfeigenbasis(mf)[1]; v = mfcoefs(F, 1200);
print("# a_l, l prime <= 1200, of the newform orbit of level 23 and weight 2 (lev23), field x^2 - x - 1");
print("# Computed with PARI/GP 2.15 (Debian package pari-gp): gp -q gp/level23.gp > level23.csv, where the script is");
print("#   mf=mfinit([23,2],0); F=mfeigenbasis(mf)[1]; v=mfcoefs(F,1200);");
print("#   forprime(l=2,1200,print(\"lev23,\",l,\",\",subst(lift(v[l+1]),y,x)))");
print("# Field (mffields): ", mffields(mf));
print("form,n,value");
forprime(l=2,1200,print("lev23,",l,",",subst(lift(v[l+1]),y,x)));
