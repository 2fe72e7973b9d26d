package org.streetcomb.report;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.BufferedReader;
import java.io.File;
import java.io.IOException;
import java.io.InputStreamReader;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.net.http.WebSocket;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionStage;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.junit.jupiter.api.Assumptions;

/**
 * Drives a headless Chromium (the Debian package) over the Chrome DevTools Protocol on a loopback
 * WebSocket, with the JDK's own WebSocket client: opens a page, evaluates script in it, and records every
 * console error, uncaught exception, error log entry and network request that is not a file or data URL.
 * Skips the calling test when Chromium is absent, unless STREETCOMB_CI is set (then it fails).
 */
public final class HeadlessChromium implements AutoCloseable {

    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final Pattern LISTENING = Pattern.compile("DevTools listening on (ws://\\S+)");

    private final Process process;
    private final WebSocket socket;
    private final AtomicInteger ids = new AtomicInteger();
    private final Map<Integer, CompletableFuture<JsonNode>> pending = new ConcurrentHashMap<>();
    private final List<String> problems = new ArrayList<>();
    private final List<String> requests = new ArrayList<>();

    private HeadlessChromium(Process process, WebSocket socket) {
        this.process = process;
        this.socket = socket;
    }

    /** The chromium executable on the PATH; absent skips the test, or fails it in CI. */
    public static Path executable() {
        for (String dir : System.getenv().getOrDefault("PATH", "").split(File.pathSeparator)) {
            for (String name : new String[] {"chromium", "chromium-browser"}) {
                Path candidate = Path.of(dir, name);
                if (Files.isExecutable(candidate)) {
                    return candidate;
                }
            }
        }
        if (System.getenv("STREETCOMB_CI") != null) {
            throw new IllegalStateException("chromium is not installed, and STREETCOMB_CI is set: .ci/run must install it");
        }
        Assumptions.abort("chromium is not installed: skipping the browser test (install the Debian package chromium)");
        return null;
    }

    static HeadlessChromium start(Path profile) throws Exception {
        Process process = new ProcessBuilder(executable().toString(), "--headless", "--no-sandbox", "--disable-gpu",
                "--disable-background-networking", "--disable-component-update", "--disable-sync", "--no-first-run",
                "--disable-extensions", "--user-data-dir=" + profile, "--remote-debugging-port=0",
                "--window-size=1400,900", "about:blank")
                .redirectOutput(ProcessBuilder.Redirect.DISCARD)
                .start();
        String endpoint = endpoint(process);
        String port = URI.create(endpoint).getPort() + "";
        HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();
        JsonNode targets = MAPPER.readTree(http.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + port + "/json/list"))
                .build(), HttpResponse.BodyHandlers.ofString()).body());
        String page = null;
        for (JsonNode target : targets) {
            if ("page".equals(target.path("type").asText())) {
                page = target.path("webSocketDebuggerUrl").asText();
                break;
            }
        }
        if (page == null) {
            process.destroyForcibly();
            throw new IllegalStateException("chromium opened no page: " + targets);
        }
        Listener listener = new Listener();
        WebSocket socket = http.newWebSocketBuilder().buildAsync(URI.create(page), listener).get(10, TimeUnit.SECONDS);
        HeadlessChromium chromium = new HeadlessChromium(process, socket);
        listener.owner = chromium;
        chromium.call("Runtime.enable", MAPPER.createObjectNode());
        chromium.call("Log.enable", MAPPER.createObjectNode());
        chromium.call("Page.enable", MAPPER.createObjectNode());
        chromium.call("Network.enable", MAPPER.createObjectNode());
        return chromium;
    }

    private static String endpoint(Process process) throws IOException {
        BufferedReader err = new BufferedReader(new InputStreamReader(process.getErrorStream(), StandardCharsets.UTF_8));
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(30);
        String line;
        while (System.nanoTime() < deadline && (line = err.readLine()) != null) {
            Matcher m = LISTENING.matcher(line);
            if (m.find()) {
                Thread drain = new Thread(() -> {
                    try {
                        while (err.readLine() != null) {
                            // keep the pipe empty so chromium never blocks on its log
                        }
                    } catch (IOException ignored) {
                        // the browser has gone
                    }
                }, "chromium-stderr");
                drain.setDaemon(true);
                drain.start();
                return m.group(1);
            }
        }
        process.destroyForcibly();
        throw new IllegalStateException("chromium did not report its DevTools endpoint within 30 s");
    }

    /** Opens a file and waits until the page marks itself ready ({@code body[data-ready]}); forgets earlier problems. */
    void open(Path file) throws Exception {
        synchronized (this) {
            problems.clear();
            requests.clear();
        }
        ObjectNode params = MAPPER.createObjectNode().put("url", file.toUri().toString());
        call("Page.navigate", params);
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (System.nanoTime() < deadline) {
            JsonNode ready = eval("document.readyState === 'complete' && document.body.dataset.ready === 'true'");
            if (ready.asBoolean()) {
                return;
            }
            Thread.sleep(50);
        }
        throw new AssertionError("the page did not become ready within 60 s; problems: " + problems());
    }

    /** Evaluates an expression in the page and returns its value as JSON. */
    JsonNode eval(String expression) throws Exception {
        ObjectNode params = MAPPER.createObjectNode().put("expression", expression).put("returnByValue", true)
                .put("awaitPromise", true);
        JsonNode result = call("Runtime.evaluate", params);
        if (result.has("exceptionDetails")) {
            throw new AssertionError("script failed: " + expression + " -> " + result.get("exceptionDetails"));
        }
        return result.path("result").path("value");
    }

    /** Sets the page's viewport in CSS pixels, as a browser window of that size would have. */
    void viewport(int width, int height) throws Exception {
        call("Emulation.setDeviceMetricsOverride", MAPPER.createObjectNode().put("width", width).put("height", height)
                .put("deviceScaleFactor", 1).put("mobile", false));
    }

    byte[] screenshot() throws Exception {
        JsonNode shot = call("Page.captureScreenshot", MAPPER.createObjectNode().put("format", "png"));
        return java.util.Base64.getDecoder().decode(shot.path("data").asText());
    }

    /** Console errors and warnings, uncaught exceptions and error log entries seen so far. */
    synchronized List<String> problems() {
        return List.copyOf(problems);
    }

    /** URLs the page requested other than file: and data: URLs. */
    synchronized List<String> networkRequests() {
        return List.copyOf(requests);
    }

    private JsonNode call(String method, ObjectNode params) throws Exception {
        int id = ids.incrementAndGet();
        CompletableFuture<JsonNode> reply = new CompletableFuture<>();
        pending.put(id, reply);
        ObjectNode message = MAPPER.createObjectNode().put("id", id).put("method", method);
        message.set("params", params);
        socket.sendText(MAPPER.writeValueAsString(message), true).get(10, TimeUnit.SECONDS);
        JsonNode answer = reply.get(60, TimeUnit.SECONDS);
        if (answer.has("error")) {
            throw new AssertionError(method + " failed: " + answer.get("error"));
        }
        return answer.path("result");
    }

    private synchronized void event(JsonNode message) {
        String method = message.path("method").asText();
        JsonNode params = message.path("params");
        switch (method) {
            case "Runtime.exceptionThrown" -> problems.add("exception: " + params.path("exceptionDetails"));
            case "Runtime.consoleAPICalled" -> {
                String type = params.path("type").asText();
                if (type.equals("error") || type.equals("warning") || type.equals("assert")) {
                    problems.add("console." + type + ": " + params.path("args"));
                }
            }
            case "Log.entryAdded" -> {
                String level = params.path("entry").path("level").asText();
                if (level.equals("error") || level.equals("warning")) {
                    problems.add("log " + level + ": " + params.path("entry").path("text").asText());
                }
            }
            case "Network.requestWillBeSent" -> {
                String url = params.path("request").path("url").asText();
                if (!url.startsWith("file:") && !url.startsWith("data:")) {
                    requests.add(url);
                }
            }
            default -> {
            }
        }
    }

    @Override
    public void close() throws Exception {
        try {
            socket.sendText("{\"id\":0,\"method\":\"Browser.close\"}", true).get(5, TimeUnit.SECONDS);
        } catch (Exception ignored) {
            // the process is ended below either way
        }
        if (!process.waitFor(10, TimeUnit.SECONDS)) {
            process.destroyForcibly();
            process.waitFor(10, TimeUnit.SECONDS);
        }
    }

    /** Reassembles fragmented text frames and routes replies to their callers, events to the recorder. */
    private static final class Listener implements WebSocket.Listener {
        volatile HeadlessChromium owner;
        private final StringBuilder buffer = new StringBuilder();

        @Override
        public CompletionStage<?> onText(WebSocket webSocket, CharSequence data, boolean last) {
            buffer.append(data);
            if (last) {
                String text = buffer.toString();
                buffer.setLength(0);
                try {
                    JsonNode message = MAPPER.readTree(text);
                    HeadlessChromium chromium = owner;
                    if (message.has("id")) {
                        CompletableFuture<JsonNode> reply = chromium == null ? null : chromium.pending.remove(message.get("id").asInt());
                        if (reply != null) {
                            reply.complete(message);
                        }
                    } else if (chromium != null) {
                        chromium.event(message);
                    }
                } catch (IOException e) {
                    throw new IllegalStateException("unreadable DevTools message", e);
                }
            }
            webSocket.request(1);
            return null;
        }
    }
}
