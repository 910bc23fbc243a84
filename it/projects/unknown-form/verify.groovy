// Coefficient rows of a form that forms.csv does not declare.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:28:1: error [table-format] form=lev37_wt2_o1: expected a form id from forms.csv, found lev37_wt2_o1; no form with this id is declared; its rows are skipped')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
return true
