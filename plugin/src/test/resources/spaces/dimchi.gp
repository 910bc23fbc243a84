\\ dim S_k(Gamma0(N),chi) and its new part, one character per Galois orbit, N <= 100, 2 <= k <= 6
cell(G,chi)={my(g=G.gen,s=""); if(charorder(G,chi)==1,return("1")); for(i=1,#g, my(v=chareval(G,chi,lift(g[i]))); s=concat(s,Str(if(i>1,";",""),lift(g[i]),":",numerator(v),"/",denominator(v)))); s};
{for(N=1,100, G=znstar(N,1); seen=Map();
  for(a=1,max(N,1), if(gcd(a,N)!=1 || mapisdefined(seen,a%N), next);
    o=znorder(Mod(a,N)); for(j=1,o, if(gcd(j,o)==1, mapput(seen,lift(Mod(a,N)^j),1)));
    chi=znconreychar(G,a); c=cell(G,chi);
    for(k=2,6, print(N",",k",",c",",charorder(G,chi)",",mfdim([N,k,Mod(a,N)],1)",",mfdim([N,k,Mod(a,N)],0)))))}
