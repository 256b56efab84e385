package org.headway.fitting;

import org.headway.fitting.Instruction.Op;

/** A node of an {@link Expression}'s syntax tree; constant sub-trees are folded as it is built. */
sealed interface ExpressionNode permits ExpressionNode.Leaf, ExpressionNode.Apply {

    /** Bit k set when the node's value depends on parameter k. */
    long mask();

    /**
     * A constant, a data column or a parameter.
     *
     * @param op {@link Op#CONSTANT}, {@link Op#VARIABLE} or {@link Op#PARAMETER}
     * @param constant the value of a constant
     * @param index the column or parameter, −1 for a constant
     */
    record Leaf(Op op, double constant, int index) implements ExpressionNode {
        @Override
        public long mask() {
            return op == Op.PARAMETER ? 1L << index : 0L;
        }

        boolean isConstant() {
            return op == Op.CONSTANT;
        }
    }

    /**
     * An operation on one or two operands.
     *
     * @param right the second operand, null for a function of one argument or a sign
     */
    record Apply(Op op, ExpressionNode left, ExpressionNode right) implements ExpressionNode {
        @Override
        public long mask() {
            return left.mask() | (right == null ? 0L : right.mask());
        }
    }

    /**
     * The node for an operation, folded to a constant when its operands are constants. The folding
     * runs the evaluator's own loop on one point, so the constant is the double evaluation would give.
     */
    static ExpressionNode make(Op op, ExpressionNode left, ExpressionNode right) {
        if (isConstant(left) && (right == null || isConstant(right))) {
            double[] a = {((Leaf) left).constant()};
            double[] b = {right == null ? 0.0 : ((Leaf) right).constant()};
            double[] v = new double[1];
            Instruction in = new Instruction(op, 0.0, -1, 0, right == null ? -1 : 1, 0L);
            Operations.apply(in, new double[][] {a, b}, new double[2][][], v, null, 1);
            return new Leaf(Op.CONSTANT, v[0], -1);
        }
        return new Apply(op, left, right);
    }

    private static boolean isConstant(ExpressionNode node) {
        return node instanceof Leaf leaf && leaf.isConstant();
    }
}
