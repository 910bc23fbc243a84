\\ Search for companion forms (Gross 1990): for a rational newform f of weight k, level N, and a prime
\\ p not dividing N with 2 <= k <= p - 1, look for a newform g of weight k' = p + 1 - k and level N and a
\\ prime P above p in the field of g with a_l(g) == l^(k'-1) a_l(f) mod P for all primes l <= B, l != p,
\\ l not dividing N. Prints one line per hit: N, p, k, k', index of f, index of g, the factor of the field
\\ polynomial of g mod p naming P (or "rational").
\\ Run: gp -q plugin/src/test/resources/weights/companion-search.gp
\\ Output with PARI/GP 2.15.2 (N,p,k,k',i,j,factor):
\\   1,23,12,12,1,1,rational        Delta is its own companion at 23
\\   1,31,16,16,1,1,rational        the weight-16 form is its own companion at 31
\\   21,5,2,4,1,2,rational   32,5,2,4,1,2,rational   38,5,2,4,1,1,rational
\\   26,7,2,6,1,2,y + 5      27,7,2,6,1,1,rational   36,7,2,6,1,1,rational
\\   49,11,2,10,1,1,rational 27,13,2,12,1,1,rational 32,13,2,12,1,1,rational
\\   32,13,2,12,1,2,7*y + 3  36,13,2,12,1,2,rational
\\   (N=38, p=11: skipped, p divides a denominator of a field element)
\\ No hit for N = 1 at other p <= 61 and weights 12..30 (e.g. none for Delta at 13, 17, 19), none for N = 11.
default(parisizemax, 2*10^9);
B = 150;
search(N, k, p) =
{
  my(kk = p + 1 - k, Mf, Mg, Bf, Bg, Fg);
  if (kk < 2 || N % p == 0, return);
  Mf = mfinit([N, k, 1], 0); if (mfdim(Mf) == 0, return);
  Mg = mfinit([N, kk, 1], 0); if (mfdim(Mg) == 0, return);
  Bf = mfeigenbasis(Mf); Bg = mfeigenbasis(Mg); Fg = mffields(Mg);
  for (i = 1, #Bf,
    my(af = mfcoefs(Bf[i], B));
        if (poldegree(mffields(Mf)[i]) > 1, next);
    for (j = 1, #Bg,
      my(ag = mfcoefs(Bg[j], B), P = Fg[j], G);
      G = if (poldegree(P) <= 1, 0, Mod(1, p) * P);
      forprime(l = 2, B,
        if (l == p || N % l == 0, next);
        my(d = lift(ag[l + 1]) - l^(kk - 1) * af[l + 1]);
        if (poldegree(P) <= 1,
          if (d % p != 0, G = -1; break),
          G = iferr(gcd(G, Mod(1, p) * lift(d)), E, print("# skipped N=", N, " p=", p, " k=", k, " g=", j, ": p divides a denominator"); -1);
          if (G == -1, break);
          if (poldegree(G) == 0, G = -1; break)));
      if (G != -1, print(N, ",", p, ",", k, ",", kk, ",", i, ",", j, ",", if (G == 0, "rational", lift(G))))));
}
\\ level 1, weights 12..30; levels 11..50 in weight 2
forprime(p = 5, 61, forstep(k = 12, 30, 2, search(1, k, p)));
forprime(p = 5, 13, for(N = 11, 50, search(N, 2, p)));
