// mvn eigengate:help (prefix from the plugin in the pom) lists the goals check, report and help.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('eigengate:check')
expect('eigengate:help')
expect('eigengate:report')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
