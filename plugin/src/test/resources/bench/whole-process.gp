\\ Whole-process row, PARI/GP side: Tr T_n for n <= 10^4 coprime to 997 on S_2^new(Gamma0(997)), summed.
v = mfcoefs(mftraceform([997, 2, 1], 0), 10^4); print(sum(n = 1, 10^4, if (n % 997, v[n+1], 0))); quit;
