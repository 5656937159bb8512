package org.resonancegate.maven;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.junit.jupiter.api.Test;

/**
 * Include/exclude patterns against the semantics Maven documents for resource and fileset
 * patterns ("**" matches zero or more directories; a trailing "/" means "/**"), checked by
 * example rather than against our own regex.
 */
class GlobPatternTest {

    @Test
    void doubleStarSpansZeroOrMoreDirectories() {
        GlobPattern p = GlobPattern.of("**/*.json");
        assertTrue(p.matches("a.json"));
        assertTrue(p.matches("pumps/a.json"));
        assertTrue(p.matches("plant/pumps/a.json"));
        assertFalse(p.matches("a.json5"));
        assertFalse(p.matches("a.yaml"));
    }

    @Test
    void singleStarAndQuestionMarkStayInOneDirectory() {
        assertTrue(GlobPattern.of("*.json").matches("a.json"));
        assertFalse(GlobPattern.of("*.json").matches("pumps/a.json"));
        assertTrue(GlobPattern.of("p?.json").matches("p1.json"));
        assertFalse(GlobPattern.of("p?.json").matches("p12.json"));
        assertFalse(GlobPattern.of("p?.json").matches("p/.json"));
    }

    @Test
    void prefixedAndTrailingSlashPatterns() {
        assertTrue(GlobPattern.of("vibration/**/*.json").matches("vibration/a.json"));
        assertTrue(GlobPattern.of("vibration/**/*.json").matches("vibration/x/y/a.json"));
        assertFalse(GlobPattern.of("vibration/**/*.json").matches("proposed/a.json"));
        assertTrue(GlobPattern.of("drafts/").matches("drafts/a.json"));
        assertTrue(GlobPattern.of("drafts/").matches("drafts/old/a.json"));
        assertFalse(GlobPattern.of("drafts/").matches("a.json"));
        assertTrue(GlobPattern.of("./drafts\\*.json").matches("drafts/a.json"), "backslashes and ./ are normalised");
    }

    @Test
    void regexCharactersAreLiteral() {
        assertTrue(GlobPattern.of("p(1)+[a].json").matches("p(1)+[a].json"));
        assertFalse(GlobPattern.of("p.json").matches("pxjson"));
    }
}
