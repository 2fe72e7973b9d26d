package org.streetcomb.plan;

import java.io.IOException;
import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import org.streetcomb.InputError;
import org.streetcomb.NoTourError;
import org.streetcomb.network.Components;
import org.streetcomb.network.LonLat;
import org.streetcomb.network.NearestNode;
import org.streetcomb.network.StreetNetwork;
import org.streetcomb.solve.PostmanProblem;
import org.streetcomb.solve.ServiceDemand;
import org.streetcomb.tour.TourPlanner;

/** Turns a request into the postman problem to solve: which streets need which passes, and where tours start and end. */
final class PostmanSetup {

    private PostmanSetup() {
    }

    /** @param inside for each edge, whether it lies in the service area; null when no area is given */
    static PostmanProblem problem(PlanRequest request, StreetNetwork network, Components components, int depot,
                                  boolean[] inside, List<String> warnings) {
        ServiceOptions service = request.service();
        boolean[] required = required(request, network, warnings);
        for (int e = 0; inside != null && e < required.length; e++) {
            required[e] &= inside[e];
        }
        int depotPart = components.of(depot);
        boolean any = false;
        for (int e = 0; e < required.length; e++) {
            required[e] &= !request.depotOnly() || components.of(network.from(e)) == depotPart;
            any |= required[e];
        }
        if (!any) {
            throw new NoTourError(request.input() + ": no street is marked to be serviced");
        }
        ServiceDemand demand = ServiceDemand.of(network, required, service.kerbs());
        int[] starts = TourPlanner.starts(network, components, demand, depot, request.depotOnly());
        int end = depot;
        if (service.end() != null) {
            end = endNode(request, network, service.end());
            if (components.of(end) != depotPart) {
                throw new NoTourError(String.format(Locale.ROOT, "%s: the end %.7f,%.7f is on a part of the network "
                        + "not connected to the depot's", request.input().getFileName(), service.end().lon(), service.end().lat()));
            }
        }
        return new PostmanProblem(network, demand, starts, end);
    }

    private static int endNode(PlanRequest request, StreetNetwork network, LonLat end) {
        NearestNode.Hit hit = NearestNode.of(network, end.lon(), end.lat());
        if (hit.distance() > request.maxDepotDistance()) {
            throw new InputError(String.format(Locale.ROOT,
                    "end %.7f,%.7f is %.0f m from the nearest street node of %s (limit %.0f m): check the order "
                    + "longitude,latitude or raise the limit", end.lon(), end.lat(), hit.distance(),
                    request.input().getFileName(), request.maxDepotDistance()));
        }
        return hit.node();
    }

    /** The layer's required flags, or the streets listed in the service-ids file. */
    private static boolean[] required(PlanRequest request, StreetNetwork network, List<String> warnings) {
        boolean[] required = new boolean[network.edgeCount()];
        if (request.service().serviceIds() == null) {
            for (int e = 0; e < required.length; e++) {
                required[e] = network.required(e);
            }
            return required;
        }
        Path file = request.service().serviceIds();
        Set<String> ids = new HashSet<>();
        for (String line : idLines(file)) {
            String id = line.strip();
            if (!id.isEmpty() && !id.startsWith("#")) {
                ids.add(id);
            }
        }
        if (ids.isEmpty()) {
            throw InputError.at(file, null, "holds no street ids (one per line; # starts a comment)");
        }
        Set<String> matched = new HashSet<>();
        for (int e = 0; e < required.length; e++) {
            String id = network.feature(e).id();
            if (ids.contains(id)) {
                required[e] = true;
                matched.add(id);
            }
        }
        if (matched.isEmpty()) {
            String example = ids.stream().sorted().findFirst().orElse("");
            throw InputError.at(file, null, "none of its " + ids.size() + " ids matches a feature id of "
                    + request.input().getFileName() + " (for example '" + example + "'; the layer's ids look like '"
                    + (required.length == 0 ? "" : network.feature(0).id()) + "')");
        }
        if (matched.size() < ids.size()) {
            warnings.add((ids.size() - matched.size()) + " of the " + ids.size() + " ids in "
                    + request.service().serviceIds().getFileName() + " match no street of the layer");
        }
        return required;
    }

    /** The lines of an id list, refused in words when it is not UTF-8 text (binary, or UTF-16 from an editor). */
    private static List<String> idLines(Path file) {
        byte[] bytes;
        try {
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw InputError.at(file, null, "cannot read the list of street ids (" + InputError.inWords(e) + ")");
        }
        for (int i = 0; i < bytes.length; i++) {
            if (bytes[i] == 0) {
                throw InputError.at(file, "byte " + (i + 1), "not a text file of ids (a zero byte: binary, or "
                        + "UTF-16 text); save it as UTF-8 text, one id per line");
            }
        }
        try {
            String text = StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(bytes)).toString();
            return text.replace("\uFEFF", "").lines().toList();
        } catch (CharacterCodingException e) {
            throw InputError.at(file, null, "not UTF-8 text; save the list of ids as UTF-8, one id per line");
        }
    }
}
