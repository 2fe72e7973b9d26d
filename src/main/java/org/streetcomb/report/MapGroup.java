package org.streetcomb.report;

/**
 * A set of features across layers that the user can show or hide together, such as one tour's service
 * passes, deadhead passes and arrows.
 *
 * @param id     unique within the report
 * @param title  shown beside its switch
 * @param colour its colour in the legend ({@code #rrggbb})
 */
public record MapGroup(String id, String title, String colour) {
}
