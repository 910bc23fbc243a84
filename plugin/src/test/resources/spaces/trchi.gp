cell(G,chi)={my(g=G.gen,s=""); if(charorder(G,chi)==1,return("1")); for(i=1,#g, my(v=chareval(G,chi,lift(g[i]))); s=concat(s,Str(if(i>1,";",""),lift(g[i]),":",numerator(v),"/",denominator(v)))); s};
orbtr(x,m)=if(type(x)=="t_POLMOD",trace(x),eulerphi(m)*x);
\\ [N, order, k, conductor-must-be-less-than-N (1) or any (0)]: the least Conrey label a with that order, chi(-1)=(-1)^k, dim S_k(N,chi) > 0
L=[[13,6,2,0],[13,3,4,0],[7,2,3,0],[20,4,2,0],[21,6,2,0],[16,4,3,0],[25,5,2,0],[31,5,2,0],[45,4,3,0],[29,4,3,0],[9,6,3,0],[63,6,2,0],[11,2,5,0],[27,9,2,0],[39,6,2,1],[52,6,2,1],[45,12,3,0],[100,10,2,0],[37,3,6,0],[56,6,3,0],[91,12,2,0],[75,10,2,1],[49,7,2,0],[32,8,3,0]];
{for(i=1,#L, [N,ord,k,imp]=L[i]; G=znstar(N,1); a=0;
  for(b=2,N-1, if(gcd(b,N)!=1,next); c=znconreychar(G,b); if(charorder(G,c)!=ord,next); if(zncharisodd(G,c)!=(k%2),next);
     if(imp && zncharconductor(G,c)==N,next); if(mfdim([N,k,Mod(b,N)],1)==0,next); a=b; break);
  if(a==0, print("# none for ",L[i]); next);
  chi=znconreychar(G,a); m=charorder(G,chi);
  for(s=0,1, tot=vector(60);
    for(j=1,m, if(gcd(j,m)!=1,next); v=mfcoefs(mftraceform([N,k,Mod(a,N)^j],s),60); for(n=1,60, tot[n]+=if(type(v[n+1])=="t_POLMOD", lift(v[n+1]), v[n+1])));
    w=vector(60,n, orbtr(Mod(tot[n], polcyclo(m,'t)), m)/eulerphi(m));
    v=mfcoefs(mftraceform([N,k,Mod(a,N)],s),60); w1=vector(60,n, orbtr(v[n+1],m)); if(w!=w1, error("orbit sum != trace for ",L[i]));
    print(N",",k",",cell(G,chi)",",m",",zncharconductor(G,chi)",",s",",strjoin(apply(x->Str(x),w)," "))))}
