// The -cli jar (java -jar) gates a data directory with the goal's lines and exit codes 1, 0, 2.
def log = new File(basedir, "build.log").getText("UTF-8")
def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }
assert !(log =~ /(?m)^\s+at [\w.$]+\(/) : "a stack trace reached the log"
// the shaded command line the reactor built (plugin/target), run on the data directory as a non-Maven repository would
def dir = new File(basedir, "../../../../plugin/target").canonicalFile
def jars = dir.listFiles().findAll { it.name.endsWith("-cli.jar") }
assert jars.size() == 1 : "one -cli jar in " + dir + ": " + jars
def java = new File(System.getProperty("java.home"), "bin/java").path
def run = { List args ->
    def p = ([java, "-jar", jars[0].path] + args).execute(null, basedir)
    def out = new StringBuilder(), err = new StringBuilder()
    p.waitForProcessOutput(out, err)
    [p.exitValue(), out.toString(), err.toString()]
}
def (code, out, err) = run(["data"])
assert code == 1 : "exit " + code + "\n" + out + err
assert out.readLines() == [
    "[ERROR] eigengate: 1 error, 0 warnings, 0 notes in 1 dataset (2 forms, 24 coefficient rows, 22 checks)",
    "[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=3, a_2=-2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)",
    "[ERROR] eigengate: report in target/eigengate/report.html"] : out
assert err == "" : "no progress line when stderr is not a terminal: " + err
assert new File(basedir, "target/eigengate/report.html").text.contains("Failing: 1 error in the tables")
def (helpCode, help, helpErr) = run(["--help"])
assert helpCode == 0 && help.startsWith("Usage: eigengate ")
def (badCode, badOut, badErr) = run(["no-such-dir"])
assert badCode == 2 && badErr.startsWith("eigengate: not a dataset directory: no-such-dir")
return true
