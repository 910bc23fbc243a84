// tau(l) = l^3 a_l(f11) mod 5 is false, and the finding says that twist 1 makes it hold (tau(l) = l(1 + l) = l a_l(f11) mod 5).
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/congruences.csv:3: error [congruence] congruence=delta~f11 p=5 j=3: expected a_2(delta) = 2^3*a_2(f11) = 4 mod (5, x) and (5, x), found a_2(delta) = 1; the congruence fails at l = 2, the first prime l not dividing 55 where the residues differ; it holds for every tabulated l <= 12 with twist j = 1 instead (mod (5, x) and (5, x))')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
