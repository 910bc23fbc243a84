// A declared space with an orbit missing fails the dimension check.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/spaces.csv:5: error [space-dimension] space=N=37 k=2: expected dim S_k^new(Γ0(N)) = 2, found sum of field degrees = 0 (no forms); the declared forms do not fill the new subspace: an orbit is missing (or a field is too small)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
assert log.contains("[ERROR] eigengate: 1 error,") : "only the missing space fails"
return true
