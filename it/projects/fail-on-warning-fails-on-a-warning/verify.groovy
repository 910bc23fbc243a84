// failOnWarning=true fails the build on a warning (here: an unknown column).
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[INFO] eigengate: 0 errors, 1 warning, 0 notes in 1 dataset')
expect('eigengate: 0 errors and 1 warning in the data (listed above; full report in target/eigengate/report.html); failOnWarning is set')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
