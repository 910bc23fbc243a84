#!/bin/sh
# Whole-process row (JVM start included): Tr T_n, n <= 10^4 coprime to 997, on S_2^new(Gamma0(997)), five rounds each,
# CPU time (user + sys) of the whole process; the JVM once with its default JIT, once with the client compiler only
# (-XX:TieredStopAtLevel=1: no C2 compiler threads, which cost more CPU than they save in a 0.2 s run). Run from the repository root after
#   mvn -B -o -q -pl plugin test-compile
# as: sh plugin/src/test/resources/bench/whole-process.sh
CP=plugin/target/classes:plugin/target/test-classes
GP=plugin/src/test/resources/bench/whole-process.gp
for i in 1 2 3 4 5; do
  /usr/bin/time -f "eigengate-c1 %U %S" java -XX:TieredStopAtLevel=1 -cp "$CP" io.github.eigengate.theory.spaces.TraceBench once 997 2
  /usr/bin/time -f "eigengate-default %U %S" java -cp "$CP" io.github.eigengate.theory.spaces.TraceBench once 997 2
  /usr/bin/time -f "pari %U %S" gp -q "$GP" < /dev/null
done 2>&1 | grep -v Warning
