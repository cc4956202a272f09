package org.thermion.model;

/** An instance in the module hierarchy; {@code parent} is -1 for the top. */
public record ModuleInstance(int id, String path, String type, int parent) {
    /** The last part of the path. */
    public String leaf() {
        int dot = path.lastIndexOf('.');
        return dot < 0 ? path : path.substring(dot + 1);
    }
}
