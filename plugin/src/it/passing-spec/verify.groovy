// The passing spec: build succeeds, the record is written, the table and count line are printed.
def log = new File(basedir, 'build.log').text
def results = new File(basedir, 'target/resonance-gate/results.json')
assert results.isFile()
def json = new groovy.json.JsonSlurper().parse(results)
assert json.format == 'resonance-gate-results/1'
assert json.specs.size() == 1
assert json.specs[0].file == 'src/vibration/chiller-pump.json'
assert json.specs[0].id == 'IT-1'
assert json.specs[0].status == 'pass'
assert json.specs[0].checks*.criterion == ['SEP']
assert json.specs[0].checks[0].status == 'pass'
// f_n = sqrt(k/m)/(2 pi) = sqrt(2e6/500)/(2 pi) = 10.066 Hz (single-degree-of-freedom closed form)
assert Math.abs(json.specs[0].modes[0].frequencyHz - 10.066) < 0.001
assert log.contains('[INFO] 1 spec: 1 pass, 0 fail, 0 error; 0 criteria failed')
assert log.contains('[INFO] Caution: a screening aid on linear models.')
// the help goal describes the check goal's parameters with their user properties
assert log.contains('resonance-gate:check')
assert log.contains('User property: resonance-gate.failOnViolation')
assert log.contains('User property: resonance-gate.specDirectory')
assert log.contains('User property: resonance-gate.formats')
assert log.contains('User property: resonance-gate.summaryFile')
assert log.contains('BUILD SUCCESS')
return true
