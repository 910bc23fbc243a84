// A torsion order from another curve fails (PARI/GP: elltors(ellinit([0,-1,1,-10,-20]))[1] = 5).
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/curves.csv:3:3: error [curve-torsion] form=f11 torsion: expected 5, found 1; E(Q)_tors of [0,-1,1,-10,-20] has order 5')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
