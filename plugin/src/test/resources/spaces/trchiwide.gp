cell(G,chi)={my(g=G.gen,s=""); if(charorder(G,chi)==1,return("1")); for(i=1,#g, my(v=chareval(G,chi,lift(g[i]))); s=concat(s,Str(if(i>1,";",""),lift(g[i]),":",numerator(v),"/",denominator(v)))); s};
orbtr(x,m)=if(type(x)=="t_POLMOD",trace(x),eulerphi(m)*x);
L=concat([3..80],[81,96,100,121,125,128,144,169,243,256]);
{for(i=1,#L, N=L[i]; G=znstar(N,1); seen=Map();
  for(a=2,N-1, if(gcd(a,N)!=1 || mapisdefined(seen,a), next);
    o=znorder(Mod(a,N)); for(j=1,o, if(gcd(j,o)==1, mapput(seen,lift(Mod(a,N)^j),1)));
    chi=znconreychar(G,a); m=charorder(G,chi); k=if(zncharisodd(G,chi),3,2);
    if(mfdim([N,k,Mod(a,N)],1)==0, k+=2; if(mfdim([N,k,Mod(a,N)],1)==0, next));
    for(s=0,1, v=mfcoefs(mftraceform([N,k,Mod(a,N)],s),40);
      print(N",",k",",cell(G,chi)",",m",",zncharconductor(G,chi)",",s",",strjoin(apply(x->Str(orbtr(x,m)),v[2..41])," ")))))}
