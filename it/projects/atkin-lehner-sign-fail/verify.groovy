// A wrong Atkin-Lehner sign at 2 || 30 contradicts a_2, the root number and the count of signs in the complete space.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:4: error [atkin-lehner] form=lev30_wt2_o1 q=2: expected a_2 = 1, found a_2 = -1 with w_2 = -1;')
expect('[ERROR] data/forms.csv:3:7: error [atkin-lehner] form=lev30_wt2_o1 root_number: expected -1, found +1;')
expect('[ERROR] data/spaces.csv:3: error [atkin-lehner-count] space=N=30 k=2 q=2: expected 1 with w_2 = +1, 0 with -1, found 0 with +1, 1 with -1 (lev30_wt2_o1:-1);')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
