// -Dresonance-gate.formats=sarif,junit: those two files and no others.
def log = new File(basedir, 'build.log').text
def out = new File(basedir, 'target/resonance-gate')
assert out.list().sort() == ['junit.xml', 'results.sarif']
assert log.contains('[INFO] resonance-gate: report: target/resonance-gate/results.sarif (also junit.xml)')
assert log.contains('BUILD SUCCESS')
return true
