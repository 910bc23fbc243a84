// A curve of the right conductor but another isogeny class fails the traces check at p = 2 (PARI/GP: ellap(ellinit([0,1,1,-23,-50]), 2) = 0).
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/curves.csv:3:2: error [curve-traces] form=f37 p=2: expected a_2 = -2 (data/coefficients.csv:24), found a_2 = 0 (the curve); a_p of the curve [0,1,1,-23,-50] must equal a_p of the form (modularity); they differ at 7 of the 8 primes p ≤ 19 of the table')
expect('[ERROR] eigengate: 1 error, 0 warnings, 0 notes in 1 dataset')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
