// A misspelt key is a diagnostic naming the file, line and column, and it fails the build.
def log = new File(basedir, 'build.log').text
assert log =~ /(?m)^\[ERROR\] src\/vibration\/boiler-feed\.json:7:5: IT-3 .*stifness/
assert log.contains('[ERROR] 1 spec: 0 pass, 0 fail, 1 error; 0 criteria failed')
assert log.contains('resonance-gate: 1 spec has errors')
assert log.contains('BUILD FAILURE')
def json = new groovy.json.JsonSlurper().parse(new File(basedir, 'target/resonance-gate/results.json'))
assert json.specs[0].status == 'error'
assert json.specs[0].errors.any { it.file == 'src/vibration/boiler-feed.json' && it.line == 7 && it.column == 5 }
assert json.specs[0].checks.isEmpty()
return true
