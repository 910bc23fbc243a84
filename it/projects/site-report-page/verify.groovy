// mvn site gives the site an Eigengate page (the example project tables) with report.html beside it.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
def page = new File(basedir, "target/site/eigengate.html").getText("UTF-8")
assert page.contains("Eigengate: passing") : page
assert page.contains("0 errors, 0 warnings") : page
assert page.contains('href="eigengate/report.html"') : page
def html = new File(basedir, "target/site/eigengate/report.html").getText("UTF-8")
assert html.contains("Passing: no error in the tables")
return true
