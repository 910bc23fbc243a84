#!/usr/bin/env python3
# Regenerates it/projects/*: one small project per behaviour, each with a verify.groovy asserting exact log lines.
# Run: python3 it/tools/generate-projects.py (then review the diff). Values: see the comments on L11 and L23 below.
import os, textwrap
import pathlib
root=str(pathlib.Path(__file__).resolve().parent.parent / 'projects')
POM='''<?xml version="1.0" encoding="UTF-8"?>
<project xmlns="http://maven.apache.org/POM/4.0.0"
         xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance"
         xsi:schemaLocation="http://maven.apache.org/POM/4.0.0 https://maven.apache.org/xsd/maven-4.0.0.xsd">
  <modelVersion>4.0.0</modelVersion>
  <groupId>io.github.eigengate.it</groupId>
  <artifactId>%(name)s</artifactId>
  <version>1.0</version>
  <packaging>pom</packaging>
  <description>%(desc)s</description>
  <build>
    <plugins>
      <plugin>
        <groupId>@project.groupId@</groupId>
        <artifactId>eigengate-maven-plugin</artifactId>
        <version>@project.version@</version>
        <executions>
          <execution>
            <phase>verify</phase>
            <goals><goal>check</goal></goals>
          </execution>
        </executions>%(config)s
      </plugin>
    </plugins>
  </build>
</project>
'''
# a_n of the weight-2 newform of level 11, n = 1..12: OEIS A006571; also computed with PARI/GP 2.15.2 (Debian pari-gp):
# mfcoefs(mfeigenbasis(mfinit([11,2],0))[1], 12)
L11 = [1, -2, -1, 2, 1, 2, -2, 0, -2, -2, 1, -2]
# level 23, weight 2, field y^2 - y - 1 (here x^2 - x - 1), PARI/GP 2.15.2:
# apply(lift, mfcoefs(mfeigenbasis(mfinit([23,2],0))[1], 12))
L23 = ['1', '-x', '2*x - 1', 'x - 1', '-2*x', '-x - 2', '-2*x + 2', '2*x - 1', '2', '2*x + 2', '2*x - 4', '-x + 3']
SRC = ('# a_n: level 11 from OEIS A006571; level 23 computed with PARI/GP 2.15.2 (Debian package pari-gp):\n'
       '#   apply(lift, mfcoefs(mfeigenbasis(mfinit([23,2],0))[1], 12))   (field y^2 - y - 1, written in x)\n')
FORMS = '# two newforms: S_2(Gamma0(11)) and one orbit of S_2(Gamma0(23))\nid,level,weight,character,field\nlev11_wt2_o1,11,2,,\nlev23_wt2_o1,23,2,,x^2 - x - 1\n'
def coeffs(l11=L11, l23=L23, extra=''):
    s = SRC + 'form,n,value\n'
    for i,v in enumerate(l11): s += 'lev11_wt2_o1,%d,%s\n' % (i+1, v)
    for i,v in enumerate(l23): s += 'lev23_wt2_o1,%d,%s\n' % (i+1, ('"%s"' % v) if ',' in v else v)
    return s + extra
def project(name, desc, files, expect, fail=True, config='', extra_verify=''):
    d = os.path.join(root, name)
    os.makedirs(d, exist_ok=True)
    open(os.path.join(d,'pom.xml'),'w').write(POM % dict(name=name, desc=desc.replace('&', '&amp;').replace('<', '&lt;').replace('>', '&gt;'), config=config))
    for fn, content in files.items():
        p = os.path.join(d, fn)
        os.makedirs(os.path.dirname(p), exist_ok=True)
        mode = 'wb' if isinstance(content, bytes) else 'w'
        open(p, mode).write(content)
    if 'invoker.properties' not in files: open(os.path.join(d,'invoker.properties'),'w').write('invoker.buildResult = %s\n' % ('failure' if fail else 'success'))
    v = '// %s\n' % desc
    v += 'def log = new File(basedir, "build.log").getText("UTF-8")\n'
    v += 'def expect = { String line -> assert log.contains(line) : "missing in build.log: " + line }\n'
    for e in expect:
        v += 'expect(%s)\n' % groovy(e)
    v += 'assert !(log =~ /(?m)^\\s+at [\\w.$]+\\(/) : "a stack trace reached the log"\n'
    v += extra_verify
    v += 'return true\n'
    open(os.path.join(d,'verify.groovy'),'w').write(v)
def groovy(s):
    return "'" + s.replace('\\','\\\\').replace("'", "\\'") + "'"

GOOD = {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs()}
project('clean-dataset-passes', 'True coefficients pass; reports are written.', GOOD,
        ['[INFO] eigengate: 0 errors, 0 warnings, 0 notes in 1 dataset (2 forms, 24 coefficient rows'],
        fail=False, extra_verify='''def json = new File(basedir, "target/eigengate/report.json").getText("UTF-8")
assert json.contains('"passed": true')
def xml = new File(basedir, "target/eigengate/TEST-eigengate.xml").getText("UTF-8")
assert xml.contains('<testcase classname="eigengate.normalisation" name="form lev11_wt2_o1"/>')
''')
project('skip-property-skips', 'eigengate.skip skips even a broken dataset.', {'data/forms.csv': 'id,level\n'},
        ['[INFO] eigengate: skipped'], fail=False, config='\n        <configuration><skip>true</skip></configuration>')
bad = list(L11); bad[0] = 2
project('normalisation-fail', 'a_1 = 2 fails the normalisation check, naming file, line, form and n.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=bad)},
        ['[ERROR] data/coefficients.csv:4: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, found 2; a newform is normalised so that a_1 = 1'],
        extra_verify='''def xml = new File(basedir, "target/eigengate/TEST-eigengate.xml").getText("UTF-8")
assert xml.contains('<testcase classname="eigengate.normalisation" name="form lev11_wt2_o1">')
assert xml.contains('<failure message="data/coefficients.csv:4: error [normalisation]')
def json = new File(basedir, "target/eigengate/report.json").getText("UTF-8")
assert json.contains('"check": "normalisation", "severity": "error", "file": "data/coefficients.csv", "line": 4')
''')
project('bad-integer-level', 'A level that is not an integer.',
        {'data/forms.csv': FORMS.replace('lev11_wt2_o1,11,', 'lev11_wt2_o1,eleven,'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:3:2: error [table-format] form=lev11_wt2_o1: expected an integer in [1, 2147483647], found eleven; 'level' must be a decimal integer"])
project('bad-level-range', 'Level 0 is out of range.',
        {'data/forms.csv': FORMS.replace('lev11_wt2_o1,11,', 'lev11_wt2_o1,0,'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:3:2: error [table-format] form=lev11_wt2_o1: expected an integer in [1, 2147483647], found 0; 'level' is out of range"])
project('bad-weight-range', 'Weight 0 is out of range.',
        {'data/forms.csv': FORMS.replace('lev23_wt2_o1,23,2,', 'lev23_wt2_o1,23,0,'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:4:3: error [table-format] form=lev23_wt2_o1: expected an integer in [1, 10000], found 0; 'weight' is out of range"])
b = list(L11); b[5] = '1/2'
project('bad-rational-value', 'A non-integer a_n for a form with rational coefficients.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b)},
        ["[ERROR] data/coefficients.csv:9:3: error [table-format] form=lev11_wt2_o1 n=6: expected an integer, found 1/2; the form has rational coefficients (no field), so a_n must be an integer"])
b = list(L23); b[2] = '2*x^^2'
project('bad-expression', 'An unparsable polynomial expression.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l23=b)},
        ["[ERROR] data/coefficients.csv:18:3: error [table-format] form=lev23_wt2_o1 n=3: expected a polynomial in x with rational coefficients or a vector [c0, ..., c1], found 2*x^^2; the expression cannot be read at character"])
b = list(L23); b[3] = '[-1, 1, 0]'
project('bad-vector-length', 'A power-basis vector with three entries in a quadratic field.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l23=b)},
        ["[ERROR] data/coefficients.csv:19:3: error [table-format] form=lev23_wt2_o1 n=4: expected a polynomial in x with rational coefficients or a vector [c0, ..., c1], found [-1, 1, 0]; the vector has 3 entries but the field has degree 2"])
project('unknown-form', 'Coefficient rows of a form that forms.csv does not declare.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(extra='lev37_wt2_o1,1,1\nlev37_wt2_o1,2,-2\n')},
        ["[ERROR] data/coefficients.csv:28:1: error [table-format] form=lev37_wt2_o1: expected a form id from forms.csv, found lev37_wt2_o1; no form with this id is declared; its rows are skipped"])
project('duplicate-coefficient', 'a_5 given twice with different values.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(extra='lev11_wt2_o1,5,-1\n')},
        ["[ERROR] data/coefficients.csv:28:3: error [table-format] form=lev11_wt2_o1 n=5: expected 1, found -1; a_5 is given twice with different values (first at data/coefficients.csv:8)"])
project('reducible-field', 'A field polynomial that factors over Q.',
        {'data/forms.csv': FORMS.replace('x^2 - x - 1', 'x^2 - 1'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:4:5: error [table-format] form=lev23_wt2_o1: expected a monic irreducible polynomial in x with integer coefficients, found x^2 - 1; the field polynomial is reducible over Q: it factors as"])
project('nonmonic-field', 'A field polynomial that is not monic.',
        {'data/forms.csv': FORMS.replace('x^2 - x - 1', '2*x^2 - x - 1'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:4:5: error [table-format] form=lev23_wt2_o1: expected a monic irreducible polynomial in x with integer coefficients, found 2*x^2 - x - 1; the field polynomial is not monic"])
project('nonintegral-field', 'A field polynomial with a non-integral coefficient.',
        {'data/forms.csv': FORMS.replace('x^2 - x - 1', 'x^2 - 1/2*x - 1'), 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv:4:5: error [table-format] form=lev23_wt2_o1: expected a monic irreducible polynomial in x with integer coefficients, found x^2 - 1/2*x - 1; the field polynomial has non-integral coefficients"])
project('missing-column', 'coefficients.csv without the value column.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': 'form,n\nlev11_wt2_o1,1\n'},
        ["[ERROR] data/coefficients.csv:1: error [table-format] table=data/coefficients.csv: expected a column 'value', found columns form,n; the column 'value' is required in data/coefficients.csv"])
project('empty-file', 'An empty forms.csv.',
        {'data/forms.csv': '', 'data/coefficients.csv': coeffs()},
        ["[ERROR] data/forms.csv: error [table-format] table=data/forms.csv: expected a header row, found an empty file; every table starts with a header row naming its columns"])
project('not-utf8', 'A coefficients file that is not UTF-8.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': b'form,n,value\nlev11_wt2_o1,1,1\nlev11_wt2_o1,2,\xff\xfe\n'},
        ["[ERROR] data/coefficients.csv:3: error [table-format] table=data/coefficients.csv: expected UTF-8 text, found bytes that are not UTF-8; line 3 is not valid UTF-8; it is not read"])
b6 = list(L11); b6[5] = '-2'
project('threads-and-cache', 'Two threads and a cache directory of its own: the planted error is reported as with one thread, and the cache is written.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b6)},
        ['[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=3, a_2=-2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)'],
        config='\n        <configuration><threads>2</threads><cacheDirectory>${project.build.directory}/gate-cache</cacheDirectory></configuration>',
        extra_verify='assert new File(basedir, "target/gate-cache").listFiles().length > 0 : "the cache was not written"\n')
project('missing-dataset', 'A configured dataset directory that does not exist.',
        {'README.md': 'The configured dataset directory tables/ is missing on purpose.\n'},
        ["[ERROR] tables: error [table-format] dataset=tables: expected a dataset directory, found nothing; the dataset directory does not exist"],
        config='\n        <configuration><datasets><dataset>${project.basedir}/tables</dataset></datasets></configuration>')
project('many-errors-collected', 'Every malformed row of a run is reported, not only the first.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=['1','x','-1','2','y','2','-2','0','-2','-2','1','z'])},
        ["[ERROR] eigengate: 3 errors", "data/coefficients.csv:5:3: error [table-format] form=lev11_wt2_o1 n=2",
         "data/coefficients.csv:8:3: error [table-format] form=lev11_wt2_o1 n=5",
         "data/coefficients.csv:15:3: error [table-format] form=lev11_wt2_o1 n=12"])
b = list(L11); b[5] = '-2'
project('hecke-fail-composite', 'A composite coefficient that breaks a_mn = a_m a_n is named with both sides.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=b)},
        ['[ERROR] data/coefficients.csv:9: error [hecke-relations] form=lev11_wt2_o1 n=6: expected 2, found -2; a_mn = a_m a_n for coprime m=2, n=3, a_2=-2, a_3=-1 (Diamond–Shurman Prop. 5.8.5)'])
project('space-missing-orbit', 'A declared space with an orbit missing fails the dimension check.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(),
         'data/spaces.csv': '# S_2(Gamma0(11)) and S_2(Gamma0(23)) are complete here; S_2(Gamma0(37)) (dimension 2) is not\nlevel,weight\n11,2\n23,2\n37,2\n'},
        ['[ERROR] data/spaces.csv:5: error [space-dimension] space=N=37 k=2: expected dim S_k^new(Γ0(N)) = 2, found sum of field degrees = 0 (no forms); the declared forms do not fill the new subspace: an orbit is missing (or a field is too small)'],
        extra_verify='assert log.contains("[ERROR] eigengate: 1 error,") : "only the missing space fails"\n')
bad = list(L11); bad[0] = 2
project('skip-checks-property', 'eigengate.skipChecks turns a check off by its id.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(l11=bad),
         'invoker.properties': 'invoker.systemPropertiesFile = test.properties\ninvoker.buildResult = success\n',
         'test.properties': 'eigengate.skipChecks = normalisation,hecke-relations\n'},
        ['[INFO] eigengate: 0 errors'], fail=False)
project('unknown-skip-check', 'An unknown check id in skipChecks is a configuration error, not a data error.',
        {'data/forms.csv': FORMS, 'data/coefficients.csv': coeffs(),
         'invoker.properties': 'invoker.goals = verify -Deigengate.skipChecks=no-such-check\ninvoker.buildResult = failure\n'},
        ["eigengate: unknown check 'no-such-check' in skipChecks; known checks: normalisation, field-sanity"])
project('datasets-by-property', 'eigengate.datasets takes comma-separated directories; each is checked.',
        {'tables-a/forms.csv': FORMS, 'tables-a/coefficients.csv': coeffs(),
         'tables-b/forms.csv': FORMS, 'tables-b/coefficients.csv': coeffs(l11=bad),
         'invoker.properties': 'invoker.systemPropertiesFile = test.properties\ninvoker.buildResult = failure\n',
         'test.properties': 'eigengate.datasets = tables-a,tables-b\n'},
        ['[ERROR] eigengate: 3 errors, 0 warnings, 0 notes in 2 datasets (4 forms, 48 coefficient rows',
         '[ERROR] tables-b/coefficients.csv:4: error [normalisation] form=lev11_wt2_o1 n=1: expected 1, found 2'])
# a_n of the level-11 newform, n <= 20: OEIS A006571; PARI/GP 2.15.2: mfcoefs(mfeigenbasis(mfinit([11,2],0))[1], 20)
L11_20 = L11 + [4, 4, -1, -4, -2, 4, 0, 2]
# tau(n), n <= 12: OEIS A000594; PARI/GP 2.15.2: vector(12, n, ramanujantau(n))
TAU = [1, -24, 252, -1472, 4830, -6048, -16744, 84480, -113643, -115920, 534612, -370944]
FORMS2 = '# Delta and the newform of level 11\nid,level,weight\ndelta,1,12\nf11,11,2\n'
def coeffs2():
    s = ('# tau(n): OEIS A000594 (PARI/GP: ramanujantau(n)); level 11: OEIS A006571 (PARI/GP: mfcoefs(mfeigenbasis(mfinit([11,2],0))[1], 20))\n'
         'form,n,value\n')
    for i, v in enumerate(TAU): s += 'delta,%d,%d\n' % (i + 1, v)
    for i, v in enumerate(L11_20): s += 'f11,%d,%d\n' % (i + 1, v)
    return s
project('congruence-certified-with-certificate',
        'tau(l) = a_l(f11) mod 11 (a classical congruence, from memory; checked in PARI/GP) is certified from l <= 12 and a certificate is written.',
        {'data/forms.csv': FORMS2, 'data/coefficients.csv': coeffs2(),
         'data/congruences.csv': '# Delta = f11 mod 11: tau(l) = a_l(f11) mod 11 for l != 11\nform,other,p\ndelta,f11,11\n'},
        ['[INFO] data/congruences.csv:3: note [congruence] congruence=delta~f11 p=11: certified: a_l(delta) = l^0*a_l(f11) mod a prime above 11 for every prime l not dividing 11, having checked every l <= B = 12'],
        fail=False, extra_verify='''def cert = new File(basedir, "target/eigengate/certificates/congruence-delta-f11-p11.txt").getText("UTF-8")
assert cert.contains("bound B = floor(W*index/12): 12") : cert
assert cert.contains("sha256 ") && cert.contains("  coefficients.csv") : cert
''')
project('weight-set-missing-weight',
        'A predicted weight set that drops a Serre weight fails, naming form, p and the missing weight (level 11 is supersingular at 19: a_19 = 0).',
        {'data/forms.csv': FORMS2, 'data/coefficients.csv': coeffs2(),
         'data/modp-weights.csv': 'form,p,serre_weight,weights\nf11,19,2,"(0,0)"\n'},
        ['[ERROR] data/modp-weights.csv:2:4: error [weight-set] form=f11 p=19: expected (0,0);(18,0), found (0,0); missing (18,0);'])
