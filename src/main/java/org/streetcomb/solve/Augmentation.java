package org.streetcomb.solve;

/**
 * The deadhead a solver adds to make a network traversable in one closed walk per component.
 *
 * @param copies      for each edge, how many extra (deadhead) traversals it gets
 * @param deadhead    total length of the extra traversals, metres
 * @param oddNodes    odd-degree nodes of the network before augmentation
 * @param method      the method that ran, for the summary
 * @param certified   whether the augmentation was proved minimal
 */
public record Augmentation(int[] copies, double deadhead, int oddNodes, String method, boolean certified) {
}
