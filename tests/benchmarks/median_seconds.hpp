// The timing both benchmark programs use: the median wall-clock time of `runs` runs of `work`.
#pragma once

#include <algorithm>
#include <chrono>
#include <vector>

namespace isoquant::benchmarks {

template <typename Work>
double medianSeconds(int runs, Work work)
{
    using Clock = std::chrono::steady_clock;
    std::vector<double> seconds;
    for (int run = 0; run < runs; ++run) {
        const auto start = Clock::now();
        work();
        seconds.push_back(std::chrono::duration<double>(Clock::now() - start).count());
    }
    std::sort(seconds.begin(), seconds.end());
    return seconds[seconds.size() / 2];
}

} // namespace isoquant::benchmarks
