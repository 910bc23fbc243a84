// a_1 = 2 fails the normalisation check, naming file, line, form and n.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:4: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, found 2; a newform is normalised so that a_1 = 1')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
def xml = new File(basedir, "target/eigengate/TEST-eigengate.xml").getText("UTF-8")
assert xml.contains('<testcase classname="eigengate.normalisation" name="data: form lev11_wt2_o1">')
assert xml.contains('<failure message="data/coefficients.csv:4: error [normalisation]')
def json = new File(basedir, "target/eigengate/report.json").getText("UTF-8")
assert json.contains('"check": "normalisation", "severity": "error", "file": "data/coefficients.csv", "line": 4')
return true
