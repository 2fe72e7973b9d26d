package org.streetcomb.solve;

/**
 * A solver's answer: how often each edge is driven, and what is known about its quality.
 *
 * @param traversals  times each edge is driven (service and deadhead)
 * @param deadhead    total length driven beyond the service passes, metres
 * @param oddNodes    odd-degree nodes of the network, for the summary
 * @param method      the method that ran, for the summary
 * @param certified   whether the solution was proved minimal
 * @param lowerBound  a proven lower bound on the total driven length of any solution, metres
 */
public record Augmentation(Traversals traversals, double deadhead, int oddNodes, String method, boolean certified,
                           double lowerBound) {

    /**
     * Which relaxation {@link #lowerBound} comes from, as the method names it after "bound: " (up to the
     * closing parenthesis or semicolon), e.g. "LP relaxation with 348 odd cuts"; empty where it does not say.
     */
    public String boundSource() {
        int i = method.indexOf("bound: ");
        if (i < 0) {
            return "";
        }
        int j = i + "bound: ".length();
        int k = j;
        while (k < method.length() && method.charAt(k) != ')' && method.charAt(k) != ';') {
            k++;
        }
        return method.substring(j, k);
    }
}
