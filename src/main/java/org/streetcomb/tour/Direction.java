package org.streetcomb.tour;

/**
 * One line of a direction sheet: a run of consecutive steps on the same street with the same pass.
 *
 * @param number      1-based line number within the tour
 * @param instruction what to do at the start of the line, e.g. "Turn left onto Mill Lane"
 * @param turn        the turn that starts the line, or null for the start and the arrival
 * @param street      the street name, or for an unnamed way what it is and the named street it leads to or from
 *                    ("unnamed service road towards Mill Lane"); empty for the arrival
 * @param metres      length of the line
 * @param cumulative  distance from the start of the tour to the end of the line
 * @param service     whether the line services the street (false: deadhead)
 * @param node        the node where the line starts
 * @param firstStep   index of the line's first tour step (the tour's step count for the arrival)
 * @param steps       number of tour steps merged into the line
 * @param feature     the source feature id of the line's first step (empty for the arrival), as the layer gives it
 */
public record Direction(int number, String instruction, Turn turn, String street, double metres, double cumulative,
                        boolean service, int node, int firstStep, int steps, String feature) {
}
