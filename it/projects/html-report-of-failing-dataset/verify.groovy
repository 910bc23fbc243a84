// A failing run writes report.html: the verdict, the finding by anchor, a plot per form.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
expect('[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2;')
expect('full report in target/eigengate/report.html')
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
def html = new File(basedir, "target/eigengate/report.html").getText("UTF-8")
assert html.startsWith("<!DOCTYPE html>")
assert html.contains('<h1 id="verdict" class="eg-verdict">') && html.contains("Failing: 1 error in the tables")
assert html.contains('<tr id="finding-1" class="eg-finding eg-row-error" data-check="hecke-relations"')
assert (html =~ /<svg [^>]*class="eg-plot eg-scatter"/).size() == 2 : "one plot per form"
assert !html.contains("<link") && !html.contains("src=") : "self-contained"
return true
