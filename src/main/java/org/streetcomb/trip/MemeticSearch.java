package org.streetcomb.trip;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.function.Consumer;
import java.util.function.Supplier;
import java.util.function.ToDoubleFunction;

/**
 * The memetic algorithm of P. Lacomme, C. Prins &amp; W. Ramdane-Chérif ("Competitive memetic algorithms
 * for arc routing problems", Annals of Operations Research 131, 2004): a small population of giant tours
 * (chromosomes without trip delimiters), each decoded into trips by an optimal split; two parents chosen
 * by binary tournament give a child by order crossover (OX); the child is split, improved by local search
 * at a given rate, and its improved trips joined end to end become its chromosome; it replaces a random
 * member of the worse half unless its score equals that of another member (no clones, which keeps the
 * population diverse). The search breeds a fixed number of children, so its time does not depend on the
 * machine's load (the published rule also stops on a count without improvement). Written here because the decoder and the local search are this package's own;
 * seeded, so runs repeat exactly. O(children * (split + rate * local search)).
 */
final class MemeticSearch {

    /** Members of the population, as in the published algorithm, for up to {@link #FULL_SIZE} tasks. */
    static final int POPULATION = 30;
    /**
     * Tasks up to which the population and the children run in full (every gdb, val and egl instance); beyond,
     * both shrink with the square of the size, so a town-sized plan keeps the default quick.
     */
    static final int FULL_SIZE = 100;
    /**
     * Share of children (and first members) improved by local search; 0.3 and 0.5 were tried on the
     * benchmark sets, 0.5 reached lower gaps at about 1.5 times the time.
     */
    static final double IMPROVE_RATE = 0.5;
    /** Tries to draw an initial member that is not a clone before giving up on that slot. */
    private static final int CLONE_TRIES = 5;
    private static final double SAME = 1e-7;

    /** Cuts a giant tour (task ids) into trips of task references, improving them by local search when asked. */
    interface Decoder {
        List<int[]> decode(int[] order, boolean improve);
    }

    private record Member(int[] order, List<int[]> trips, double score) {
    }

    private final Decoder decoder;
    private final ToDoubleFunction<List<int[]>> score;
    private final Random random;
    private final List<Member> population = new ArrayList<>();

    private final Consumer<String> progress;

    /** @param progress told of the search's progress, about every tenth of the children */
    MemeticSearch(Decoder decoder, ToDoubleFunction<List<int[]>> score, Random random, Consumer<String> progress) {
        this.decoder = decoder;
        this.score = score;
        this.random = random;
        this.progress = progress;
    }

    /**
     * @param first     the improved trips to start from (always a member)
     * @param orders    draws further giant tours for the initial population
     * @param budget    children to breed for up to {@link #FULL_SIZE} tasks
     * @return the best trips found
     */
    List<int[]> run(List<int[]> first, Supplier<int[]> orders, int budget) {
        int n = TripPlanner.concatenate(first).length;
        // a decode's local search costs about tasks times trip length, so beyond FULL_SIZE both the population
        // and the children shrink with the square of the size: a town-sized plan (Aurich, 1,900 tasks) breeds
        // one child at the default effort and keeps it within seconds; more effort buys more children
        double scale = Math.min(1.0, (double) FULL_SIZE / Math.max(1, n));
        int size = Math.max(2, (int) Math.round(POPULATION * scale * scale));
        int children = (int) Math.round(budget * scale * scale);
        population.clear();
        population.add(member(first));
        for (int slot = 1; slot < size; slot++) {
            for (int attempt = 0; attempt < CLONE_TRIES; attempt++) {
                Member m = member(decoder.decode(orders.get(), random.nextDouble() < IMPROVE_RATE));
                if (!clone(m.score(), -1)) {
                    population.add(m);
                    break;
                }
            }
        }
        population.sort(Comparator.comparingDouble(Member::score));
        int every = Math.max(1, children / 10);
        for (int c = 0; c < children && population.size() > 1; c++) {
            if (c % every == 0 && c > 0) {
                progress.accept(String.format(java.util.Locale.ROOT, "trip search: %d of %d candidates, best total %.0f",
                        c, children, population.get(0).score()));
            }
            int[] order = crossover(tournament().order(), tournament().order());
            Member child = member(decoder.decode(order, random.nextDouble() < IMPROVE_RATE));
            int half = population.size() / 2;
            int replaced = half + random.nextInt(population.size() - half);
            if (!clone(child.score(), replaced)) {
                population.set(replaced, child);
                population.sort(Comparator.comparingDouble(Member::score));
            }
        }
        return population.get(0).trips();
    }

    private Member member(List<int[]> trips) {
        return new Member(TripPlanner.concatenate(trips), trips, score.applyAsDouble(trips));
    }

    private boolean clone(double s, int except) {
        for (int i = 0; i < population.size(); i++) {
            if (i != except && Math.abs(population.get(i).score() - s) <= SAME * Math.max(1, Math.abs(s))) {
                return true;
            }
        }
        return false;
    }

    private Member tournament() {
        Member a = population.get(random.nextInt(population.size()));
        Member b = population.get(random.nextInt(population.size()));
        return a.score() <= b.score() ? a : b;
    }

    /**
     * Order crossover (OX, Davis 1985; in the cyclic form Lacomme et al. use): the child keeps
     * {@code one[i..j]} in place and takes the remaining tasks in the order they follow j in the other parent.
     */
    private int[] crossover(int[] one, int[] other) {
        int n = one.length;
        int[] child = new int[n];
        if (n < 2) {
            return one.clone();
        }
        int i = random.nextInt(n);
        int j = random.nextInt(n);
        if (i > j) {
            int t = i;
            i = j;
            j = t;
        }
        boolean[] taken = new boolean[n];
        for (int k = i; k <= j; k++) {
            child[k] = one[k];
            taken[one[k]] = true;
        }
        int at = (j + 1) % n;
        for (int k = 0; k < n; k++) {
            int task = other[(j + 1 + k) % n];
            if (!taken[task]) {
                child[at] = task;
                at = (at + 1) % n;
            }
        }
        return child;
    }
}
