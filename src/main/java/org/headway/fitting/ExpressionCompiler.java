package org.headway.fitting;

import java.util.ArrayList;
import java.util.List;

/**
 * Compiles an {@link Expression}'s syntax tree to the program the evaluator runs: the tree in
 * post-order, each step carrying the parameters its value depends on.
 */
final class ExpressionCompiler {

    private ExpressionCompiler() {}

    /**
     * @param root the syntax tree
     * @return the steps; the last one is the expression's value
     */
    static Instruction[] compile(ExpressionNode root) {
        List<Instruction> program = new ArrayList<>();
        emit(root, program);
        return program.toArray(new Instruction[0]);
    }

    /** Appends the steps of a sub-tree and returns the index of its last step. */
    private static int emit(ExpressionNode node, List<Instruction> out) {
        if (node instanceof ExpressionNode.Leaf leaf) {
            out.add(new Instruction(leaf.op(), leaf.constant(), leaf.index(), -1, -1, leaf.mask()));
        } else {
            ExpressionNode.Apply apply = (ExpressionNode.Apply) node;
            int l = emit(apply.left(), out);
            int r = apply.right() == null ? -1 : emit(apply.right(), out);
            out.add(new Instruction(apply.op(), 0.0, -1, l, r, apply.mask()));
        }
        return out.size() - 1;
    }
}
