package org.thermion.elab;

import org.thermion.lang.Diagnostics;
import org.thermion.lang.ast.Decl;

import java.util.Map;

/**
 * Expands the top module into the flat netlist, in stages: {@link NameDeclarer} (scopes and
 * names) → {@link LoopUnroller} (generate loops, budgets) → {@link StatementLowering} and
 * {@link ExpressionLowering} (expressions to {@link Logic} bits) → {@link StageMapper} (bits onto
 * stages, into the {@link NetBuilder}) → {@link ComplementResolver} (inverters decided once all
 * drivers are known) → {@link GateSharing} (identical gates shared). {@link Instantiator} ties them together at each {@code use}.
 */
final class ModuleExpansion {
    final NetBuilder nb;
    final InstanceTree tree;
    final StageMapper mapper;
    /** The top module's names. */
    final Map<String, Signal> topScope;

    private ModuleExpansion(NetBuilder nb, InstanceTree tree, StageMapper mapper, Map<String, Signal> topScope) {
        this.nb = nb;
        this.tree = tree;
        this.mapper = mapper;
        this.topScope = topScope;
    }

    static ModuleExpansion of(Decl.Module top, Declarations decls, Parts parts, Diagnostics diags, int phases) {
        NetBuilder nb = new NetBuilder(diags);
        ConstantFolder folder = new ConstantFolder(diags);
        StageMapper mapper = new StageMapper(nb, parts, diags);
        ExpressionLowering exprs = new ExpressionLowering(decls, parts, diags, folder);
        StatementLowering statements = new StatementLowering(exprs, mapper, parts, diags, phases);
        LoopUnroller unroller = new LoopUnroller(statements, folder, diags);
        Instantiator instances = new Instantiator(decls, new NameDeclarer(nb, folder, diags), unroller, statements, diags);
        unroller.instancesBy(instances);
        Scope scope = instances.top(top);
        ComplementResolver.resolve(mapper);
        GateSharing.share(nb, parts.realizer("not"));
        return new ModuleExpansion(nb, instances.tree, mapper, scope.names);
    }
}
