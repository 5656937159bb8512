// -Dresonance-gate.summaryFile: the Markdown summary, headed with the module's id, is written
// there too, even though the build fails on the spec.
def log = new File(basedir, 'build.log').text
assert log.contains('BUILD FAILURE')
def summary = new File(basedir, 'target/ci/job-summary.md')
assert summary.isFile()
def text = summary.text
assert text.startsWith('### resonance-gate: summary-file\n')
assert text.contains('**1 spec: 0 pass, 1 fail, 0 error; 1 criterion failed**')
assert text.contains('| fail | IT-2 | SEP | separation | src/vibration/tower-fan.json:9:5 |')
assert text.contains('*Caution: a screening aid on linear models.')
assert new File(basedir, 'target/resonance-gate/summary.md').isFile()
return true
