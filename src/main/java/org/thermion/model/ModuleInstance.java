package org.thermion.model;

/**
 * An instance in the module hierarchy; {@code parent} is -1 for the top. {@code built} is false
 * for an instance the machine block marks {@code notbuilt}: its stages are not in the netlist
 * (the outputs it would drive are machine inputs, switches), so fault lists, plans and budgets
 * cover the built part only.
 */
public record ModuleInstance(int id, String path, String type, int parent, boolean built) {

    /** A built instance. */
    public ModuleInstance(int id, String path, String type, int parent) {
        this(id, path, type, parent, true);
    }

    /** The last part of the path. */
    public String leaf() {
        int dot = path.lastIndexOf('.');
        return dot < 0 ? path : path.substring(dot + 1);
    }

    /** This instance marked not built yet. */
    public ModuleInstance notBuilt() {
        return new ModuleInstance(id, path, type, parent, false);
    }
}
