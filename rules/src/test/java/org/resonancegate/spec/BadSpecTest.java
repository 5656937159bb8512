package org.resonancegate.spec;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Every kind of bad value gives a diagnostic at the offending value (or key), saying what was
 * found and what would be accepted. Each case edits the valid spec in one place; expected
 * positions are counted in the edited text by {@link TestProject#at}.
 */
class BadSpecTest {

    private static final String FILE = "src/vibration/chw-p-02.json";

    @TempDir
    Path base;

    private String text;
    private LoadedSpec loaded;

    /** Loads VALID with {@code from} replaced by {@code to}. */
    private void edit(String from, String to) {
        assertTrue(TestProject.VALID.contains(from), from);
        text = TestProject.VALID.replace(from, to);
        loaded = new TestProject(base).loadOne(FILE, text);
    }

    private void expectOnly(String snippet, String... words) {
        SourceLocation at = TestProject.at(FILE, text, snippet);
        Diagnostic d = TestProject.assertOnlyDiagnostic(loaded, at.line(), at.column(), words);
        assertEquals(FILE, d.location().file());
    }

    private void expect(String snippet, String... words) {
        SourceLocation at = TestProject.at(FILE, text, snippet);
        TestProject.assertDiagnostic(loaded, at.line(), at.column(), words);
    }

    // --- keys -------------------------------------------------------------------------------

    @Test
    void unknownTopLevelKeySuggestsTheNearestAndListsAccepted() {
        edit("\"criteria\": [", "\"critera\": [");
        // one slip, one line: the missing "criteria" is the misspelt key, and the line says so
        expectOnly("\"critera\"", "unknown key \"critera\"", "did you mean \"criteria\"", "accepted keys: format, id,");
    }

    @Test
    void aMissingKeyNotExplainedByATypoIsStillSaid() {
        edit("\"criteria\": [", "\"checks\": [");
        expect("\"checks\"", "unknown key \"checks\"");
        expect("{\n", "missing required key \"criteria\"");
        assertEquals(2, loaded.diagnostics().size());
    }

    @Test
    void unknownKeyInsideTheModel() {
        edit("\"mass\": \"1850 kg\", \"stiffness\"", "\"mass\": \"1850 kg\", \"stiffnes\"");
        expect("\"stiffnes\"", "unknown key \"stiffnes\"", "did you mean \"stiffness\"",
                "kind, mass, stiffness, staticDeflection, naturalFrequency, damping");
        expect("{\"kind\": \"single\"", "needs exactly one of \"stiffness\", \"staticDeflection\", \"naturalFrequency\"");
    }

    @Test
    void unknownKeyWithoutACloseMatchGetsNoSuggestion() {
        edit("\"id\": \"CHW-P-02\",", "\"id\": \"CHW-P-02\", \"colour\": \"green\",");
        expectOnly("\"colour\"", "unknown key \"colour\"", "accepted keys:");
        assertTrue(!loaded.diagnostics().get(0).message().contains("did you mean"));
    }

    @Test
    void missingRequiredKeyPointsAtTheObject() {
        edit("\"model\": {\"kind\": \"single\", \"mass\": \"1850 kg\", \"stiffness\": \"2.4 MN/m\", \"damping\": {\"ratio\": 0.05}},\n", "");
        expectOnly("{\n", "missing required key \"model\"", "\"kind\": \"single\"");
    }

    @Test
    void wrongJsonTypeNamesWhatWasFoundAndWanted() {
        edit("\"id\": \"CHW-P-02\"", "\"id\": 2");
        expectOnly("2,\n", "\"id\" must be a string", "found a number");
    }

    // --- quantities -------------------------------------------------------------------------

    @Test
    void wrongDimensionNamesKeyUnitDimensionAndAcceptedUnits() {
        edit("\"mass\": \"1850 kg\"", "\"mass\": \"5 N/m\"");
        expectOnly("\"5 N/m\"", "\"mass\"", "'N/m' is a stiffness", "expects a mass", "kg, t, g, lb");
    }

    @Test
    void bareNumberForADimensionalValueShowsAnExample() {
        edit("\"mass\": \"1850 kg\"", "\"mass\": 1850");
        expectOnly("1850,", "bare number 1850", "\"1850 kg\"");
    }

    @Test
    void unknownUnitSuggestsTheNearest() {
        edit("\"stiffness\": \"2.4 MN/m\"", "\"stiffness\": \"2.4 Mn/m\"");
        expectOnly("\"2.4 Mn/m\"", "unknown unit 'Mn/m'", "did you mean 'MN/m'", "N/m, kN/m, MN/m, N/mm, kN/mm, lbf/in");
    }

    @Test
    void unparseableNumber() {
        edit("\"mass\": \"1850 kg\"", "\"mass\": \"about 1850 kg\"");
        expectOnly("\"about", "does not start with a number", "\"<number> <unit>\"");
    }

    @Test
    void numberTooLargeToHold() {
        edit("\"mass\": \"1850 kg\"", "\"mass\": \"1e400 kg\"");
        expectOnly("\"1e400 kg\"", "too large");
    }

    @Test
    void jsonNumberTooLargeToHold() {
        edit("{\"ratio\": 0.05}", "{\"ratio\": 1e400}");
        expectOnly("1e400", "too large");
    }

    @Test
    void massMustBePositive() {
        edit("\"mass\": \"1850 kg\"", "\"mass\": \"0 kg\"");
        expectOnly("\"0 kg\"", "\"mass\" must be greater than zero");
    }

    @Test
    void stiffnessMustBePositive() {
        edit("\"2.4 MN/m\"", "\"-2.4 MN/m\"");
        expectOnly("\"-2.4 MN/m\"", "\"stiffness\" must be greater than zero");
    }

    @Test
    void twoStiffnessFormsAreRefusedAtTheSecond() {
        edit("\"stiffness\": \"2.4 MN/m\",", "\"stiffness\": \"2.4 MN/m\", \"naturalFrequency\": \"5 Hz\",");
        expectOnly("\"naturalFrequency\"", "only one of", "conflicts with \"stiffness\"");
    }

    // --- damping ----------------------------------------------------------------------------

    @Test
    void missingDampingIsAnError() {
        edit(", \"damping\": {\"ratio\": 0.05}}", "}");
        expectOnly("{\"kind\"", "missing required key \"damping\"", "infinite amplitude");
    }

    @Test
    void dampingRatioIsAcceptedInTheOpenIntervalZeroToOne() {
        edit("{\"ratio\": 0.05}", "{\"ratio\": 5}");
        expectOnly("5}", "\"ratio\" must lie in (0, 1)", "\"5 %\"");
        edit("{\"ratio\": 0.05}", "{\"ratio\": 0}");
        expectOnly("0}", "\"ratio\" must lie in (0, 1)");
        edit("{\"ratio\": 0.05}", "{\"ratio\": \"99 %\"}");
        TestProject.spec(loaded);
    }

    @Test
    void negativeDampingIsRefused() {
        edit("{\"ratio\": 0.05}", "{\"lossFactor\": -0.1}");
        expectOnly("-0.1", "\"lossFactor\" must lie in (0, 2)");
        edit("{\"ratio\": 0.05}", "{\"coefficient\": \"-5 N·s/m\"}");
        expectOnly("\"-5 N·s/m\"", "\"coefficient\" must be greater than zero");
    }

    @Test
    void twoDampingFormsAreRefused() {
        edit("{\"ratio\": 0.05}", "{\"ratio\": 0.05, \"q\": 10}");
        expectOnly("\"q\"", "damping takes only one of", "\"q\" conflicts with \"ratio\"");
    }

    @Test
    void unknownDampingForm() {
        edit("{\"ratio\": 0.05}", "{\"zeta\": 0.05}");
        expect("\"zeta\"", "unknown key \"zeta\"", "ratio, lossFactor, q, logDecrement, coefficient");
    }

    @Test
    void percentageNeedsASpaceBeforeTheSign() {
        edit("\"margin\": \"20 %\"", "\"margin\": \"20%\"");
        expectOnly("\"20%\"", "space before the percent sign", "\"20 %\"");
    }

    @Test
    void dimensionlessStringNeedsAPercentSign() {
        edit("{\"ratio\": 0.05}", "{\"ratio\": \"0.05\"}");
        expectOnly("\"0.05\"", "dimensionless", "a number or a percentage");
    }

    // --- model kinds, format ----------------------------------------------------------------

    @Test
    void singleModelKeysUnderAnotherKindAreNamedAsUnknown() {
        edit("\"kind\": \"single\", \"mass\"", "\"kind\": \"lumped\", \"mass\"");
        expect("{\"kind\": \"lumped\"", "missing required key \"motion\" in a lumped model", "\"translation\"");
        expect("\"mass\"", "unknown key \"mass\" in a lumped model", "did you mean \"masses\"");
        expect("\"stiffness\"", "unknown key \"stiffness\" in a lumped model", "accepted keys: kind, motion, masses");
        edit("\"kind\": \"single\", \"mass\"", "\"kind\": \"rigid-body\", \"mass\"");
        expect("\"stiffness\"", "unknown key \"stiffness\" in a rigid-body model", "mounts");
        expect("{\"kind\": \"rigid-body\"", "missing required key \"centreOfGravity\"");
        expect("{\"kind\": \"rigid-body\"", "missing required key \"mounts\"");
    }

    @Test
    void unknownModelKindListsTheAcceptedOnes() {
        edit("\"kind\": \"single\", \"mass\"", "\"kind\": \"singel\", \"mass\"");
        expectOnly("\"singel\"", "unknown model kind", "did you mean \"single\"", "accepted: \"single\"");
    }

    @Test
    void unsupportedFormatNamesTheSupportedOnes() {
        edit("\"resonance-gate/1\"", "\"resonance-gate/2\"");
        expectOnly("\"resonance-gate/2\"", "unsupported format", "\"resonance-gate/1\"", "\"resonance-gate-profile/1\"");
        assertEquals(java.util.Optional.of("CHW-P-02"), loaded.id());
    }

    // --- operation --------------------------------------------------------------------------

    @Test
    void negativeSpeedIsRefused() {
        edit("\"min\": \"900 rpm\"", "\"min\": \"-900 rpm\"");
        expectOnly("\"-900 rpm\"", "\"min\" must not be negative");
    }

    @Test
    void speedMinAboveMaxIsRefused() {
        edit("\"min\": \"900 rpm\", \"max\": \"1480 rpm\"", "\"min\": \"1500 rpm\", \"max\": \"1480 rpm\"");
        expectOnly("\"1500 rpm\"", "\"min\" (1500 rpm) is above \"max\" (1480 rpm)", "swap");
    }

    @Test
    void speedInHertzIsTheWrongDimension() {
        edit("\"max\": \"1480 rpm\"", "\"max\": \"24.7 Hz\"");
        expectOnly("\"24.7 Hz\"", "'Hz' is a frequency", "expects a speed", "rpm");
    }

    // --- excitations ------------------------------------------------------------------------

    private static final String EXCITATION = "{\"name\": \"impeller\", \"kind\": \"unbalance\", \"unbalance\": \"120 g·mm\"}";

    @Test
    void unknownExcitationKind() {
        edit("\"kind\": \"unbalance\"", "\"kind\": \"unbalanse\"");
        expectOnly("\"unbalanse\"", "unknown excitation kind", "did you mean \"unbalance\"",
                "unbalance, force, base-motion, order");
    }

    @Test
    void orderMustBePositive() {
        edit("\"unbalance\": \"120 g·mm\"}", "\"unbalance\": \"120 g·mm\", \"order\": 0}");
        expectOnly("0}", "\"order\" must be greater than zero");
    }

    @Test
    void unbalanceAndBalanceGradeExcludeEachOther() {
        edit("\"unbalance\": \"120 g·mm\"}", "\"unbalance\": \"120 g·mm\", \"balanceGrade\": \"G 6.3\", \"rotorMass\": \"180 kg\"}");
        expectOnly("\"balanceGrade\"", "either \"unbalance\" or \"balanceGrade\"", "not both");
    }

    @Test
    void unbalanceNeedsAnAmount() {
        edit(", \"unbalance\": \"120 g·mm\"}", "}");
        expectOnly(EXCITATION.substring(0, 1) + "\"name\": \"impeller\"", "needs \"unbalance\"", "\"G 6.3\"");
    }

    @Test
    void balanceGradeNeedsItsRotorMassAndItsLetter() {
        edit("\"unbalance\": \"120 g·mm\"}", "\"balanceGrade\": \"6.3\"}");
        expect("{\"name\": \"impeller\"", "missing required key \"rotorMass\"");
        expect("\"6.3\"", "\"G 6.3\"", "ISO 21940-11");
        assertEquals(2, loaded.diagnostics().size());
    }

    @Test
    void forceTakesOrderOrFrequencyNotBoth() {
        edit(EXCITATION, "{\"name\": \"hum\", \"kind\": \"force\", \"order\": 1, \"frequency\": \"50 Hz\", \"amplitude\": \"100 N\"}");
        expectOnly("\"frequency\"", "only one of \"order\", \"frequency\"");
        edit(EXCITATION, "{\"name\": \"hum\", \"kind\": \"force\", \"amplitude\": \"100 N\"}");
        expectOnly("{\"name\": \"hum\"", "needs exactly one of \"order\", \"frequency\"");
    }

    @Test
    void baseMotionTakesExactlyOneAmplitude() {
        edit(EXCITATION, "{\"name\": \"floor\", \"kind\": \"base-motion\", \"order\": 1, \"velocity\": \"1 mm/s\", \"acceleration\": \"0.1 gn\"}");
        expectOnly("\"acceleration\"", "only one of \"displacement\", \"velocity\", \"acceleration\"");
    }

    @Test
    void keysOfAnotherKindAreUnknownForThisOne() {
        edit(EXCITATION, "{\"name\": \"vanes\", \"kind\": \"order\", \"order\": 7, \"amplitude\": \"5 N\"}");
        expectOnly("\"amplitude\"", "unknown key \"amplitude\"", "kind \"order\"", "name, kind, phase, order");
    }

    @Test
    void phaseIsAnAngle() {
        edit("\"unbalance\": \"120 g·mm\"}", "\"unbalance\": \"120 g·mm\", \"phase\": 90}");
        expectOnly("90}", "bare number 90", "\"90 deg\"", "rad, mrad, deg");
    }

    @Test
    void excitationsMustNotBeEmpty() {
        edit("[" + EXCITATION + "]", "[]");
        expectOnly("[]", "\"excitations\" is empty");
    }

    @Test
    void atOnAnExcitationOfASingleModel() {
        edit("\"unbalance\": \"120 g·mm\"}", "\"unbalance\": \"120 g·mm\", \"at\": \"pump\"}");
        expectOnly("\"at\"", "a single model needs none");
    }

    // --- criteria ---------------------------------------------------------------------------

    private static final String CRITERION = "{\"id\": \"SEP\", \"rule\": \"separation\", \"margin\": \"20 %\"}";

    @Test
    void unknownRule() {
        edit("\"separation\"", "\"seperation\"");
        expectOnly("\"seperation\"", "unknown rule", "did you mean \"separation\"",
                "separation, isolation, displacement, velocity, transmitted-force, static-deflection");
    }

    @Test
    void axisOnTheForceOfASingleModelIsNotNeeded() {
        edit(CRITERION, "{\"id\": \"FORCE\", \"rule\": \"transmitted-force\", \"max\": \"2 kN\", \"axis\": \"z\"}");
        expectOnly("{\"id\": \"FORCE\"", "\"axis\" in criterion \"FORCE\"", "only a rigid body's mounts have axes");
    }

    @Test
    void atOnACriterionOfASingleModelIsNotNeeded() {
        edit(CRITERION, "{\"id\": \"DISP\", \"rule\": \"displacement\", \"max\": \"0.1 mm\", \"at\": \"pump\"}");
        // The criterion is read before the model is known (profiles serve several specs), so the
        // diagnostic points at the value of "at".
        expectOnly("\"pump\"", "\"at\" in criterion \"DISP\"", "a single model needs none");
    }

    @Test
    void isolationTakesOneLimit() {
        edit(CRITERION, "{\"id\": \"ISO\", \"rule\": \"isolation\", \"maxTransmissibility\": 0.1, \"minEfficiency\": \"90 %\"}");
        expectOnly("\"minEfficiency\"", "only one of \"maxTransmissibility\", \"minEfficiency\"");
    }

    @Test
    void measureMustBeOneOfTheRulesMeasures() {
        edit(CRITERION, "{\"id\": \"DISP\", \"rule\": \"displacement\", \"max\": \"0.1 mm\", \"measure\": \"rms\"}");
        expectOnly("\"rms\"", "unknown measure \"rms\"", "accepted: peak, peak-to-peak");
    }

    @Test
    void velocityLimitInTheWrongUnit() {
        edit(CRITERION, "{\"id\": \"VEL\", \"rule\": \"velocity\", \"max\": \"4.5 mm\"}");
        expectOnly("\"4.5 mm\"", "'mm' is a length", "expects a velocity", "m/s, mm/s, in/s");
    }

    @Test
    void staticDeflectionNeedsABound() {
        edit(CRITERION, "{\"id\": \"SAG\", \"rule\": \"static-deflection\"}");
        expectOnly("{\"id\": \"SAG\"", "needs \"min\", \"max\" or both");
        edit(CRITERION, "{\"id\": \"SAG\", \"rule\": \"static-deflection\", \"min\": \"9 mm\", \"max\": \"3 mm\"}");
        expectOnly("\"9 mm\"", "\"min\" (9 mm) is above \"max\" (3 mm)");
    }

    @Test
    void severityIsErrorOrWarning() {
        edit("\"margin\": \"20 %\"}", "\"margin\": \"20 %\", \"severity\": \"fatal\"}");
        expectOnly("\"fatal\"", "unknown severity", "error", "warning");
    }

    @Test
    void separationMarginIsAFraction() {
        edit("\"margin\": \"20 %\"", "\"margin\": \"120 %\"");
        expectOnly("\"120 %\"", "\"margin\" must lie in (0, 1)");
    }

    @Test
    void duplicateCriterionIdInOneFile() {
        edit(CRITERION, CRITERION + ",\n    {\"id\": \"SEP\", \"rule\": \"isolation\", \"maxTransmissibility\": 0.2}");
        expectOnly("{\"id\": \"SEP\", \"rule\": \"isolation\"", "criterion id \"SEP\" is used twice", "line 7");
    }

    @Test
    void emptyCriteriaWithoutProfilesIsRefused() {
        edit("[" + CRITERION + "]", "[]");
        expectOnly("[]", "no criteria in force");
    }

    // --- tolerances, waivers ----------------------------------------------------------------

    @Test
    void toleranceMustLieBelowOne() {
        edit("\"criteria\"", "\"tolerances\": {\"stiffness\": \"100 %\", \"mass\": 0.05},\n  \"criteria\"");
        expectOnly("\"100 %\"", "\"stiffness\" must lie in [0, 1)");
    }

    @Test
    void toleranceWithAUnitIsRefused() {
        edit("\"criteria\"", "\"tolerances\": {\"mass\": \"5 kg\"},\n  \"criteria\"");
        expectOnly("\"5 kg\"", "dimensionless");
    }

    @Test
    void waiverMustNameACriterionInForce() {
        edit("\"criteria\"", "\"waivers\": [{\"criterion\": \"SPE\", \"reason\": \"review 14\", \"expires\": \"2027-03-31\"}],\n  \"criteria\"");
        expectOnly("\"SPE\"", "not in force", "criteria in force: SEP");
    }

    @Test
    void waiverExpiryIsAnIsoDate() {
        edit("\"criteria\"", "\"waivers\": [{\"criterion\": \"SEP\", \"reason\": \"review 14\", \"expires\": \"31/03/2027\"}],\n  \"criteria\"");
        expectOnly("\"31/03/2027\"", "ISO 8601", "\"2027-03-31\"");
    }

    @Test
    void waiverNeedsAReason() {
        edit("\"criteria\"", "\"waivers\": [{\"criterion\": \"SEP\", \"expires\": \"2027-03-31\"}],\n  \"criteria\"");
        expectOnly("{\"criterion\"", "missing required key \"reason\"");
    }

    // --- all at once ------------------------------------------------------------------------

    @Test
    void allProblemsOfAFileAreReportedTogether() {
        text = TestProject.VALID
                .replace("\"1850 kg\"", "\"1850 kgs\"")
                .replace("\"900 rpm\"", "\"-900 rpm\"")
                .replace("\"unbalance\": \"120 g·mm\"", "\"unbalance\": 120")
                .replace("\"20 %\"", "\"20 %\", \"severity\": \"high\"");
        loaded = new TestProject(base).loadOne(FILE, text);
        expect("\"1850 kgs\"", "unknown unit");
        expect("\"-900 rpm\"", "must not be negative");
        expect("120}", "bare number 120", "\"120 g·mm\"");
        expect("\"high\"", "unknown severity");
        assertEquals(4, loaded.diagnostics().size(), TestProject.describe(loaded.diagnostics()));
        // In reading order.
        assertTrue(loaded.diagnostics().get(0).location().line() < loaded.diagnostics().get(3).location().line());
    }
}
