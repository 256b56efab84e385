package org.headway.fitting;

/**
 * One step of a compiled {@link Expression}: the program is the syntax tree in post-order, and an
 * operation's operands are indexes of earlier steps.
 *
 * @param op what the step does
 * @param constant the value of a {@link Op#CONSTANT} step
 * @param index the column of a {@link Op#VARIABLE} step or the parameter of a {@link Op#PARAMETER}
 *     step, else −1
 * @param left index of the first (or only) operand step, −1 for a leaf
 * @param right index of the second operand step, −1 for a leaf or a function of one argument
 * @param mask bit k set when the step's value depends on parameter k
 */
record Instruction(Op op, double constant, int index, int left, int right, long mask) {

    /** The operations of the compiled form. */
    enum Op {
        CONSTANT,
        VARIABLE,
        PARAMETER,
        ADD,
        SUBTRACT,
        MULTIPLY,
        DIVIDE,
        POWER,
        NEGATE,
        EXP,
        LOG,
        LOG10,
        SQRT,
        SIN,
        COS,
        TAN,
        ATAN,
        ABS
    }
}
