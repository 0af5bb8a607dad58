/*
 * Ebb bench: the speed limit. The multiplicative Holt-Winters recursion (seasonal update on
 * the new level, linear trend) written as one plain loop over a double array, summing the
 * squared one-step errors, as Ebb's fitting objective does. Built by the bench with `cc -O2`.
 *
 * Usage: bare-loop INPUT SECONDS TRIALS
 * INPUT (text): "count alpha beta gamma", then per series "n p firstUpdate level trend",
 * p start indices (index k serves period firstUpdate + k), n values.
 * Output (one line): "updates_per_pass best_seconds_per_pass checksum", where the seconds are
 * the process's CPU time (so other work on the machine is not counted) and checksum is the
 * summed SSE of one pass (to check the loop did the same work as the JavaScript ones).
 */
#include <stdio.h>
#include <stdlib.h>
#include <time.h>

typedef struct {
  int n, p, first;
  double level, trend;
  double *start;
  double *y;
} series;

static double seconds(clockid_t clock) {
  struct timespec ts;
  clock_gettime(clock, &ts);
  return ts.tv_sec + ts.tv_nsec * 1e-9;
}

static double sse_of(const series *s, double alpha, double beta, double gamma, double *ring) {
  const int p = s->p;
  for (int k = 0; k < p; k++) ring[(s->first + k) % p] = s->start[k];
  double level = s->level, trend = s->trend, sse = 0.0;
  int pos = s->first % p;
  for (int t = s->first; t < s->n; t++) {
    const double st = ring[pos];
    const double base = level + trend;
    const double yt = s->y[t];
    const double e = yt - base * st;
    sse += e * e;
    const double nl = alpha * yt / st + (1.0 - alpha) * base;
    ring[pos] = gamma * yt / nl + (1.0 - gamma) * st;
    trend = beta * (nl - level) + (1.0 - beta) * trend;
    level = nl;
    if (++pos == p) pos = 0;
  }
  return sse;
}

int main(int argc, char **argv) {
  if (argc != 4) {
    fprintf(stderr, "usage: bare-loop INPUT SECONDS TRIALS\n");
    return 2;
  }
  FILE *f = fopen(argv[1], "r");
  if (!f) {
    perror(argv[1]);
    return 2;
  }
  const double target = atof(argv[2]);
  const int trials = atoi(argv[3]);
  int count;
  double alpha, beta, gamma;
  if (fscanf(f, "%d %lf %lf %lf", &count, &alpha, &beta, &gamma) != 4) return 3;
  series *all = calloc(count, sizeof(series));
  int maxp = 1;
  long updates = 0;
  for (int i = 0; i < count; i++) {
    series *s = &all[i];
    if (fscanf(f, "%d %d %d %lf %lf", &s->n, &s->p, &s->first, &s->level, &s->trend) != 5) return 3;
    s->start = malloc(sizeof(double) * s->p);
    s->y = malloc(sizeof(double) * s->n);
    for (int k = 0; k < s->p; k++) if (fscanf(f, "%lf", &s->start[k]) != 1) return 3;
    for (int t = 0; t < s->n; t++) if (fscanf(f, "%lf", &s->y[t]) != 1) return 3;
    if (s->p > maxp) maxp = s->p;
    updates += s->n - s->first;
  }
  fclose(f);
  double *ring = malloc(sizeof(double) * maxp);
  volatile double sink = 0.0;
  double checksum = 0.0;
  for (int i = 0; i < count; i++) checksum += sse_of(&all[i], alpha, beta, gamma, ring);
  double best = 1e300;
  for (int trial = 0; trial < trials; trial++) {
    int passes = 0;
    const double w0 = seconds(CLOCK_MONOTONIC);
    const double c0 = seconds(CLOCK_PROCESS_CPUTIME_ID);
    do {
      double total = 0.0;
      for (int i = 0; i < count; i++) total += sse_of(&all[i], alpha, beta, gamma, ring);
      sink += total;
      passes++;
    } while (seconds(CLOCK_MONOTONIC) - w0 < target);
    const double per = (seconds(CLOCK_PROCESS_CPUTIME_ID) - c0) / passes;
    if (per < best) best = per;
  }
  printf("%ld %.9e %.17g\n", updates, best, checksum);
  return 0;
}
