#!/bin/sh
# The curve benchmark of docs/benchmarks.md, side by side with PARI/GP in one run.
# From the repository root, after one build (mvn -B -pl plugin -am test-compile):   sh bench/curves.sh
# 1. gp writes a dataset: the conductor-5077 curve [0,0,1,-7,6], its form with a_n = ellan(E, 10^6)[n], and times
#    ellan(E, 10^6) (best of 3);
# 2. CurveBench times a_p(E) for all p <= 10^6 and the whole gate on that dataset (warm, best of 5), and prints the
#    ratios.
set -e
DIR=$(mktemp -d)
gp -q <<GP
default(parisizemax, 2^31);
E = ellinit([0,0,1,-7,6]);
best = 10^9; for (i = 1, 3, gettime(); v = ellan(E, 10^6); best = min(best, gettime()));
f = fileopen("$DIR/forms.csv", "w"); filewrite(f, "id,level,weight"); filewrite(f, "f5077,5077,2"); fileclose(f);
f = fileopen("$DIR/curves.csv", "w"); filewrite(f, "form,curve,torsion"); filewrite(f, "f5077,\"[0,0,1,-7,6]\",1"); fileclose(f);
f = fileopen("$DIR/coefficients.csv", "w"); filewrite(f, "# ellan(ellinit([0,0,1,-7,6]), 10^6)"); filewrite(f, "form,n,value");
for (n = 1, #v, filewrite(f, Str("f5077,", n, ",", v[n]))); fileclose(f);
f = fileopen("$DIR/gp-ms", "w"); filewrite(f, best); fileclose(f);
GP
mvn -B -o -q -f plugin/pom.xml dependency:build-classpath -Dmdep.outputFile=target/bench.classpath -Dmdep.includeScope=test
CP="plugin/target/classes:plugin/target/test-classes:$(cat plugin/target/bench.classpath)"
java -Xmx2g -cp "$CP" io.github.eigengate.bench.CurveBench "$(cat "$DIR/gp-ms")" "$DIR"
rm -rf "$DIR"
