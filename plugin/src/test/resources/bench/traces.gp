\\ Trace-formula benchmark, PARI/GP side (run by TraceBench when gp is on the PATH, or by hand:
\\ gp -q plugin/src/test/resources/bench/traces.gp). For each row: 5 rounds, CPU time of each round in ms
\\ (gettime), and a checksum = sum of the traces (orbit traces for a character: trace() of the values in Q(chi)).
\\ Tr T_n for n <= B coprime to N on the new space (mfcoefs of the new trace form gives every n <= B; the rows sum
\\ the n coprime to N only, as Eigengate's newTrace does).
default(parisizemax, 2^31);
B = 10^4;
otr(x) = if(type(x) == "t_POLMOD", trace(x), x);
row(name, NK, space, coprime) =
{
  my(ts = vector(5), sum = 0, v, m = if(#NK > 2 && type(NK[3]) == "t_INTMOD", charorder(znstar(NK[1],1), znconreychar(znstar(NK[1],1), lift(NK[3]))), 1));
  for (r = 1, 5, gettime(); v = mfcoefs(mftraceform(NK, space), B); ts[r] = gettime());
  for (n = 1, B, if (!coprime || gcd(n, NK[1]) == 1, sum += if(type(v[n+1]) == "t_POLMOD", trace(v[n+1]), eulerphi(m) * v[n+1])));
  print(name, "\t", vecmin(ts), "\t", vecsort(ts)[3], "\t", sum);
}
row("full S_2(1000)", [1000, 2, 1], 1, 0);
row("new S_12(389)", [389, 12, 1], 0, 1);
row("S_100(1)", [1, 100, 1], 1, 0);
row("new S_2(997, chi order 3)", [997, 2, Mod(304, 997)], 0, 1);
row("new S_2(1001, chi order 6)", [1001, 2, Mod(10, 1001)], 0, 1);
quit;
