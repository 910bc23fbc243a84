// eigengate.datasets takes comma-separated directories; each is checked.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] eigengate: 1 error, 0 warnings, 0 notes in 2 datasets (4 forms, 48 coefficient rows')
expect('[ERROR] tables-b/coefficients.csv:4: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, found 2')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
