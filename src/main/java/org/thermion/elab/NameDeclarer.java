package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.Span;
import org.thermion.lang.ast.Decl;
import org.thermion.lang.ast.ModuleStmt;

import java.util.List;
import java.util.Map;

/**
 * The first stage of a module instance: its constants, then its ports, then its nets and
 * latches, each given nets in the {@link NetBuilder}. Ports come before the others so an
 * output stored in a latch is found whichever of the two lines is written first.
 */
final class NameDeclarer {
    private final NetBuilder nb;
    private final ConstantFolder folder;
    private final Diagnostics diags;

    NameDeclarer(NetBuilder nb, ConstantFolder folder, Diagnostics diags) {
        this.nb = nb;
        this.folder = folder;
        this.diags = diags;
    }

    /**
     * Declares the names of {@code m} in {@code f}; input ports found in {@code bound} take the
     * parent's nets. Returns the ports in declaration order.
     */
    void declare(Scope f, Decl.Module m, Map<String, int[]> bound, boolean top, List<Signal> ports) {
        f.consts.putAll(ConstantTable.of(m.body(), diags, true));
        for (ModuleStmt s : m.body()) {
            if (s instanceof ModuleStmt.Ports p) {
                ports(f, p, bound, top, ports);
            }
        }
        for (ModuleStmt s : m.body()) {
            if (s instanceof ModuleStmt.Nets n) {
                for (ModuleStmt.Declared d : n.nets()) {
                    int w = folder.width(f.consts, d.width());
                    f.declare(new Signal(d.name().text(), allocate(f, d.name().text(), w, d.width() != null, d.span()),
                            d.name().span(), Signal.Kind.NET, d.width() != null), diags);
                }
                if (n.init() != null && n.nets().size() != 1) {
                    diags.error(n.init().span(), "an initial expression needs exactly one net", "write one `net x = ...` per line");
                }
            } else if (s instanceof ModuleStmt.Latch l) {
                latch(f, l);
            }
        }
    }

    private void ports(Scope f, ModuleStmt.Ports p, Map<String, int[]> bound, boolean top, List<Signal> ports) {
        for (ModuleStmt.Declared d : p.ports()) {
            int w = folder.width(f.consts, d.width());
            int[] nets = bound.get(d.name().text());
            Signal.Kind kind = p.dir() == ModuleStmt.Dir.IN ? Signal.Kind.IN : Signal.Kind.OUT;
            if (nets == null) {
                nets = allocate(f, d.name().text(), w, d.width() != null, d.span());
                if (top && kind == Signal.Kind.IN) {
                    for (int n : nets) {
                        nb.driver.set(n, NetBuilder.EXTERNAL);
                    }
                }
            }
            Signal sig = new Signal(d.name().text(), nets, d.name().span(), kind, d.width() != null);
            if (f.declare(sig, diags)) {
                ports.add(sig);
            }
        }
    }

    private void latch(Scope f, ModuleStmt.Latch l) {
        int w = folder.width(f.consts, l.width());
        Signal port = f.names.get(l.name().text());
        if (port != null && port.kind() == Signal.Kind.OUT && port.width() == w) {
            // An output port stored in a latch: the latch drives the port's nets.
            f.names.put(port.name(), new Signal(port.name(), port.nets(), port.decl(), Signal.Kind.LATCH, port.bus()));
        } else {
            f.declare(new Signal(l.name().text(), allocate(f, l.name().text(), w, l.width() != null, l.name().span()),
                    l.name().span(), Signal.Kind.LATCH, l.width() != null), diags);
        }
    }

    private int[] allocate(Scope f, String name, int width, boolean bus, Span span) {
        int[] nets = new int[width];
        for (int i = 0; i < width; i++) {
            nets[i] = nb.net(f.qualify(bus ? name + "[" + i + "]" : name), f.module, span);
        }
        return nets;
    }
}
