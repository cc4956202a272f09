package org.thermion.elab;

import java.util.List;
import java.util.Map;

/**
 * A file of modules without a machine block (meant for {@code include}), checked module by
 * module: the modules, the library stage that realized each operator the file does not map
 * (by operator word: {@code not -> pentode_inverter}), and the rails its stages draw from that
 * only the including machine declares.
 */
public record ModulesAlone(List<ModuleCheck> modules, Map<String, String> libraryStages, List<String> assumedRails) {
}
