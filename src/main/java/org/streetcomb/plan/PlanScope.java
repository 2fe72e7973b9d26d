package org.streetcomb.plan;

import org.streetcomb.network.LonLat;

/**
 * What a plan asked for, given again to the audit so it measures coverage against the same streets and
 * directions: the depot, whether only the depot's part was planned, and the service options (kerbs,
 * service ids, streets left out where one-way streets cut them off). The audit derives the scope exactly as
 * {@link Planner} does ({@code PostmanSetup}, then {@code ReachabilityCheck}), so the two cannot disagree.
 *
 * @param depot      the depot position, or null for the default
 * @param depotReach the depot may lie at most this many metres from the nearest node
 * @param depotOnly  only the depot's part of the network was planned
 * @param service    the service options the plan was made with
 */
public record PlanScope(LonLat depot, double depotReach, boolean depotOnly, ServiceOptions service) {
}
