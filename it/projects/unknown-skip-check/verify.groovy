// An unknown check id in skipChecks is a configuration error, not a data error.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('eigengate: unknown check \'no-such-check\' in skipChecks; known checks: normalisation, field-sanity')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
