package org.thermion.elab;

import org.thermion.model.ModuleInstance;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** The module instances expansion placed, with each one's names and ports (read by the checks). */
final class InstanceTree {
    final List<ModuleInstance> modules = new ArrayList<>();
    /** Instance id to its names. */
    final Map<Integer, Map<String, Signal>> scopes = new HashMap<>();
    /** Instance id to its ports, in declaration order. */
    final Map<Integer, List<Signal>> ports = new HashMap<>();
}
