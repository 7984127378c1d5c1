# Shared by the bench scripts (sourced, POSIX sh): wall-clock timing of whole processes and medians.
# A process is timed from the shell with date +%s%N around it, so both sides of a ratio carry the same fork and
# exec overhead (about a millisecond here).

now_ms() { date +%s%3N; }

# time_ms CMD ARGS...: runs it with its output discarded, prints the milliseconds (fractional), fails if it fails
time_ms() {
    _start=$(date +%s%N)
    "$@" >/dev/null 2>&1 || { echo "failed: $*" >&2; return 1; }
    _end=$(date +%s%N)
    awk -v a="$_start" -v b="$_end" 'BEGIN { printf "%.1f\n", (b - a) / 1e6 }'
}

# median_of FILE / p95_of FILE: of a file with one number per line
median_of() {
    sort -n "$1" | awk '{ t[NR] = $1 } END {
        m = (NR % 2) ? t[(NR + 1) / 2] : (t[NR / 2] + t[NR / 2 + 1]) / 2; printf "%.1f", m }'
}
p95_of() {
    sort -n "$1" | awk '{ t[NR] = $1 } END { i = int(NR * 0.95 + 0.999); if (i < 1) i = 1; printf "%.1f", t[i] }'
}

ratio_of() { awk -v a="$1" -v b="$2" 'BEGIN { printf "%.2f", a / b }'; }

machine_line() {
    echo "$(nproc) cores, $(awk -F: '/model name/ { sub(/^ +/, "", $2); print $2; exit }' /proc/cpuinfo 2>/dev/null), $(awk '/MemTotal/ { printf "%.0f GiB", $2 / 1048576 }' /proc/meminfo 2>/dev/null)"
}
load_line() { cut -d' ' -f1-3 /proc/loadavg 2>/dev/null; }
