// C++17 reference for the routes bench: the same queue-based label-correcting solve as
// engine/routes/label-correcting.ts (FIFO queue, subtree disassembly of the shortest-path tree,
// everything a negative loop reaches marked unbounded), written plainly with int64 costs, so the
// bench can print Lanewright's solve time beside compiled code on the same network and check that
// both find the same costs (the checksum covers every label and the unbounded set).
//
// Build: g++ -O2 -std=c++17 label-correcting.cpp -o label-correcting
// Run:   label-correcting NETWORK.bin [RUNS]     (network file written by test/bench/solver-first-call.ts)
// Prints one JSON line: wall and CPU milliseconds of each solve (the solve only: allocation of its
// arrays included, reading the file not), then the checksum of the last solve.
//
// Network file, little-endian: 8 bytes "LWBF1\0\0\0"; int32 depots n, lanes m, source, 0;
// int32 outStart[n + 1]; int32 outTo[m]; int64 cost[m] (minor units; lanes grouped by origin).

#include <algorithm>
#include <chrono>
#include <cstdint>
#include <cstdio>
#include <cstdlib>
#include <cstring>
#include <ctime>
#include <string>
#include <vector>

namespace {

constexpr uint8_t UNSEEN = 0;
constexpr uint8_t IN_TREE = 1;
constexpr uint8_t DETACHED = 2;
constexpr uint8_t UNBOUNDED = 3;
constexpr int64_t INF = INT64_MAX;
// Lanewright keeps money exact in float64 and refuses a route cost past 2^53 - 1; so does this.
constexpr int64_t MAX_EXACT = (int64_t(1) << 53) - 1;

struct Graph {
  int32_t n = 0;
  int32_t m = 0;
  int32_t source = 0;
  std::vector<int32_t> outStart;
  std::vector<int32_t> outTo;
  std::vector<int64_t> cost;
};

struct Result {
  std::vector<int64_t> dist;
  std::vector<uint8_t> state;
  int64_t relaxations = 0;
  int64_t scans = 0;
  int64_t loops = 0;
};

[[noreturn]] void fail(const std::string& why) {
  std::fprintf(stderr, "label-correcting: %s\n", why.c_str());
  std::exit(2);
}

template <typename T>
void readArray(std::FILE* f, std::vector<T>& out, size_t count, const char* what) {
  out.resize(count);
  if (count > 0 && std::fread(out.data(), sizeof(T), count, f) != count) fail(std::string("file ends inside ") + what);
}

Graph readGraph(const char* path) {
  std::FILE* f = std::fopen(path, "rb");
  if (!f) fail(std::string("cannot open ") + path);
  char magic[8];
  int32_t header[4];
  if (std::fread(magic, 1, 8, f) != 8 || std::memcmp(magic, "LWBF1\0\0\0", 8) != 0) fail("not a bench network file");
  if (std::fread(header, sizeof(int32_t), 4, f) != 4) fail("file ends inside the header");
  Graph g;
  g.n = header[0];
  g.m = header[1];
  g.source = header[2];
  if (g.n <= 0 || g.m < 0 || g.source < 0 || g.source >= g.n) fail("header out of range");
  readArray(f, g.outStart, size_t(g.n) + 1, "outStart");
  readArray(f, g.outTo, size_t(g.m), "outTo");
  readArray(f, g.cost, size_t(g.m), "cost");
  std::fclose(f);
  if (g.outStart[0] != 0 || g.outStart[g.n] != g.m) fail("outStart does not span the lanes");
  for (int32_t d = 0; d < g.n; d++)
    if (g.outStart[d] > g.outStart[d + 1]) fail("outStart not ascending");
  for (int32_t p = 0; p < g.m; p++)
    if (g.outTo[p] < 0 || g.outTo[p] >= g.n) fail("lane to an unknown depot");
  return g;
}

Result solve(const Graph& g) {
  const int32_t n = g.n;
  const int32_t* outStart = g.outStart.data();
  const int32_t* outTo = g.outTo.data();
  const int64_t* cost = g.cost.data();

  Result r;
  r.dist.assign(n, INF);
  r.state.assign(n, UNSEEN);
  // The queue holds each depot at most once, so n + 1 slots never fill (head == tail means empty).
  const int32_t cap = n + 1;
  std::vector<int32_t> parent(n, -1), depth(n, 0), next(n, 0), prev(n, 0), queue(cap, 0);
  std::vector<uint8_t> queued(n, 0);
  std::vector<int32_t> stack, loopDepots;
  int64_t* dist = r.dist.data();
  uint8_t* state = r.state.data();
  int32_t head = 0, tail = 0;

  auto enqueue = [&](int32_t d) {
    queued[d] = 1;
    queue[tail] = d;
    tail = tail + 1 == cap ? 0 : tail + 1;
  };
  auto linkAfter = [&](int32_t a, int32_t d) {
    int32_t b = next[a];
    next[a] = d;
    prev[d] = a;
    next[d] = b;
    prev[b] = d;
  };
  // Everything reachable from the seeds is unbounded: out of the tree and out of the search.
  auto markUnbounded = [&](const std::vector<int32_t>& seeds) {
    stack.assign(seeds.begin(), seeds.end());
    while (!stack.empty()) {
      int32_t x = stack.back();
      stack.pop_back();
      if (state[x] == UNBOUNDED) continue;
      if (state[x] == IN_TREE) {
        int32_t a = prev[x], b = next[x];
        next[a] = b;
        prev[b] = a;
      }
      state[x] = UNBOUNDED;
      for (int32_t p = outStart[x]; p < outStart[x + 1]; p++)
        if (state[outTo[p]] != UNBOUNDED) stack.push_back(outTo[p]);
    }
  };

  const int32_t root = g.source;
  state[root] = IN_TREE;
  dist[root] = 0;
  next[root] = root;
  prev[root] = root;
  enqueue(root);

  while (head != tail) {
    const int32_t u = queue[head];
    head = head + 1 == cap ? 0 : head + 1;
    queued[u] = 0;
    if (state[u] != IN_TREE) continue;
    r.scans++;
    const int64_t du = dist[u];
    for (int32_t p = outStart[u], end = outStart[u + 1]; p < end; p++) {
      const int32_t v = outTo[p];
      const int64_t nd = du + cost[p];
      if (!(nd < dist[v])) continue;  // strictly cheaper only, as in Lanewright
      const uint8_t sv = state[v];
      if (sv == UNBOUNDED) continue;
      r.relaxations++;
      if (nd > MAX_EXACT || nd < -MAX_EXACT) fail("route cost out of the exact range");

      if (v == u) {  // a lane from a depot to itself with a net rebate
        r.loops++;
        markUnbounded({u});
        goto nextScan;
      }
      if (sv == IN_TREE) {
        // Detach v's subtree (the run after v in preorder with greater depth); u inside it closes a loop.
        const int32_t dv = depth[v];
        int32_t x = next[v];
        bool foundU = false;
        while (depth[x] > dv && x != root) {
          state[x] = DETACHED;
          if (x == u) {
            foundU = true;
            break;
          }
          x = next[x];
        }
        if (foundU) {
          for (int32_t y = next[v];; y = next[y]) {
            state[y] = IN_TREE;
            if (y == u) break;
          }
          loopDepots.clear();
          for (int32_t y = u; y != v; y = parent[y]) loopDepots.push_back(y);
          loopDepots.push_back(v);
          r.loops++;
          markUnbounded(loopDepots);
          goto nextScan;
        }
        const int32_t before = prev[v];
        next[before] = x;
        prev[x] = before;
      }
      dist[v] = nd;
      parent[v] = u;
      depth[v] = depth[u] + 1;
      state[v] = IN_TREE;
      linkAfter(u, v);
      if (!queued[v]) enqueue(v);
    }
  nextScan:;
    // As in Lanewright: once the root is unbounded, so is every depot ever labelled (all are
    // reachable from it), and the queue holds nothing left to scan.
    if (state[root] == UNBOUNDED) break;
  }
  return r;
}

double cpuMs() {
  timespec t;
  clock_gettime(CLOCK_PROCESS_CPUTIME_ID, &t);
  return t.tv_sec * 1e3 + t.tv_nsec / 1e6;
}

}  // namespace

int main(int argc, char** argv) {
  if (argc < 2) fail("usage: label-correcting NETWORK.bin [RUNS]");
  const int runs = argc > 2 ? std::max(1, std::atoi(argv[2])) : 5;
  const Graph g = readGraph(argv[1]);
  std::vector<double> wall, cpu;
  Result r;
  for (int i = 0; i < runs; i++) {
    const double c0 = cpuMs();
    const auto t0 = std::chrono::steady_clock::now();
    r = solve(g);
    const auto t1 = std::chrono::steady_clock::now();
    cpu.push_back(cpuMs() - c0);
    wall.push_back(std::chrono::duration<double, std::milli>(t1 - t0).count());
  }
  // Checksum: counts of reachable (bounded), unbounded and stray detached depots, and two sums of the
  // costs of reachable depots taken modulo 2^64: plain and weighted by depot index + 1.
  uint64_t sum = 0, weighted = 0;
  int64_t reachable = 0, unbounded = 0, detached = 0;
  for (int32_t d = 0; d < g.n; d++) {
    if (r.state[d] == IN_TREE) {
      reachable++;
      sum += uint64_t(r.dist[d]);
      weighted += uint64_t(d + 1) * uint64_t(r.dist[d]);
    } else if (r.state[d] == UNBOUNDED) {
      unbounded++;
    } else if (r.state[d] == DETACHED) {
      detached++;
    }
  }
  std::printf("{\"wallMs\":[");
  for (int i = 0; i < runs; i++) std::printf("%s%.3f", i ? "," : "", wall[i]);
  std::printf("],\"cpuMs\":[");
  for (int i = 0; i < runs; i++) std::printf("%s%.3f", i ? "," : "", cpu[i]);
  std::printf("],\"checksum\":\"reachable=%lld unbounded=%lld detached=%lld sum=%llu weighted=%llu\",", (long long)reachable,
              (long long)unbounded, (long long)detached, (unsigned long long)sum, (unsigned long long)weighted);
  std::printf("\"loops\":%lld,\"relaxations\":%lld,\"scans\":%lld}\n", (long long)r.loops, (long long)r.relaxations,
              (long long)r.scans);
  return 0;
}
