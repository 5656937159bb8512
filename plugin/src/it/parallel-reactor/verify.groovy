// Four modules checked on four threads in one JVM: each writes its own results, with the right
// specs and modes, and the build log shows the threads were used.
def log = new File(basedir, 'build.log').text
assert log.contains('MultiThreadedBuilder') && log.contains('thread count of 4')

def results = { String module ->
    def f = new File(basedir, module + '/target/resonance-gate/results.json')
    assert f.isFile() : module
    def json = new groovy.json.JsonSlurper().parse(f)
    assert json.format == 'resonance-gate-results/1'
    json.specs.each { assert it.status == 'pass' : module + ': ' + it }
    json
}
def near = { double a, double b -> Math.abs(a - b) <= 1e-3 * Math.abs(b) }

// single mass: f_n = sqrt(k/m)/(2 pi) (from memory, the one-degree-of-freedom closed form)
def skid = results('pump-skid')
assert skid.specs*.id == ['PR-SKID-1']
assert near(skid.specs[0].modes[0].frequencyHz, Math.sqrt(2e6 / 500) / (2 * Math.PI))

// two masses on two springs: the roots of det(K - w^2 M) = 0 (from memory, the 2x2 characteristic equation)
def line = results('pump-line')
assert line.specs*.id == ['PR-LINE-1']
double m1 = 2000, m2 = 800, k1 = 1.5e6, k2 = 60e6
double a = m1 * m2, b = -((k1 + k2) * m2 + k2 * m1), c = k1 * k2
double disc = Math.sqrt(b * b - 4 * a * c)
def expected = [(-b - disc) / (2 * a), (-b + disc) / (2 * a)].collect { Math.sqrt(it) / (2 * Math.PI) }
assert near(line.specs[0].modes[0].frequencyHz, expected[0])
assert near(line.specs[0].modes[1].frequencyHz, expected[1])

// rigid body, centre of gravity over the middle of a symmetric layout: bounce and yaw are pure
// motions, f_z = sqrt(sum kz / m)/(2 pi), f_rz = sqrt(sum(kx y^2 + ky x^2) / Izz)/(2 pi) (from memory)
def fan = results('fan-set')
assert fan.specs*.id == ['PR-FAN-1']
def modes = fan.specs[0].modes
assert modes.size() == 6
double fz = Math.sqrt(4 * 400e3 / 1000) / (2 * Math.PI)
double frz = Math.sqrt(4 * (200e3 * 0.5 * 0.5 + 200e3 * 0.8 * 0.8) / 350) / (2 * Math.PI)
assert modes.any { near(it.frequencyHz, fz) && it.shares[0].motion == 'z' } : modes
assert modes.any { near(it.frequencyHz, frz) && it.shares[0].motion == 'rz' } : modes

// two specs in one module, ordered by file; f_n = 15.76/sqrt(deflection in mm) (check-values 2.1)
def small = results('small-pumps')
assert small.specs*.file == ['src/vibration/dosing-pump.json', 'src/vibration/sample-pump.json']
assert Math.abs(small.specs[0].modes[0].frequencyHz - 15.76 / Math.sqrt(5)) < 0.01
assert near(small.specs[1].modes[0].frequencyHz, 4.0)

assert log.contains('BUILD SUCCESS')
return true
