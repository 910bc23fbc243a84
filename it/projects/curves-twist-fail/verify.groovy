// The quadratic twist by -4 of the right curve fails the traces check, which names the twist, and the conductor check (PARI/GP: ellminimalmodel(ellinit(elltwist(ellinit([0,-1,1,-10,-20]), -4))) = [0,1,0,-165,1427], conductor 176).
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/curves.csv:3:2: error [curve-traces] form=f11 p=2: expected a_2 = -2 (data/coefficients.csv:4), found a_2 = 0 (the curve); a_p of the curve [0,1,0,-165,1427] must equal a_p of the form (modularity); they differ at 4 of the 8 primes p ≤ 19 of the table; the curve looks like the twist by -4')
expect('[ERROR] data/curves.csv:3:2: error [curve-conductor] form=f11 p=2: expected f_2 = 0 (level 11), found f_2 = 4 (Kodaira II*, c_2 = 1)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
