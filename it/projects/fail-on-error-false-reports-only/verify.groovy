// failOnError=false reports the errors and writes the reports but lets the build pass.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:4: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, found 2')
expect('[WARNING] eigengate: failOnError is false: the build goes on despite 1 error (listed above; full report in target/eigengate/report.html)')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
