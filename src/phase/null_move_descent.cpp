#include "phase/null_move_descent.hpp"

#include "phase/readability.hpp"

#include <array>
#include <cstdint>
#include <optional>

namespace couplet::phase::detail {

namespace {

std::int64_t mod(std::int64_t x, std::int64_t q) {
    const std::int64_t r = x % q;
    return r < 0 ? r + q : r;
}

void add_into(int_vector& a, const int_vector& b, std::int64_t q) {
    for (std::size_t k = 0; k < a.size(); ++k) a[k] = mod(a[k] + b[k], q);
}

int_vector descend_any_level(const phase_level& level, int_vector current) {
    const std::int64_t q = level.modulus();
    const auto& moves = level.null_moves();
    readability_key current_key = readability(current, level.level());
    for (int round = 0; round < 256; ++round) {
        std::optional<int_vector> improved;
        readability_key improved_key = current_key;
        std::array<std::int64_t, 4> improved_counts = readability_counts(current, level.level());
        int_vector candidate;
        auto consider = [&]() {
            const auto counts = readability_counts(candidate, level.level());
            if (improved_counts < counts) return;  // the full key cannot be smaller
            readability_key key = readability(candidate, level.level());
            if (key < improved_key) {
                improved_key = std::move(key);
                improved_counts = counts;
                improved = candidate;
            }
        };
        for (const auto& m : moves) {
            candidate = current;
            add_into(candidate, m, q);
            consider();
        }
        if (!improved)
            for (std::size_t a = 0; a < moves.size(); ++a) {
                int_vector partial = current;
                add_into(partial, moves[a], q);
                for (std::size_t b = a + 1; b < moves.size(); ++b) {
                    candidate = partial;
                    add_into(candidate, moves[b], q);
                    consider();
                }
            }
        if (!improved) break;
        current = std::move(*improved);
        current_key = std::move(improved_key);
    }
    return current;
}

// The same descent for q = 4 with vectors bit-sliced into two words: a candidate costs a few
// word operations and popcounts instead of a pass over the entries.
struct packed_vector {
    std::uint64_t low = 0, high = 0;
    static packed_vector from(const int_vector& w) {
        packed_vector p;
        for (std::size_t i = 0; i < w.size(); ++i) {
            p.low |= static_cast<std::uint64_t>(w[i] & 1) << i;
            p.high |= static_cast<std::uint64_t>((w[i] >> 1) & 1) << i;
        }
        return p;
    }
    int_vector unpack(std::size_t size) const {
        int_vector w(size);
        for (std::size_t i = 0; i < size; ++i)
            w[i] = static_cast<std::int64_t>(((low >> i) & 1) | (((high >> i) & 1) << 1));
        return w;
    }
    packed_vector plus(const packed_vector& o) const { return {low ^ o.low, high ^ o.high ^ (low & o.low)}; }
    // Criteria 1-4 of the readability order at level 1: terms, non-integers (none), entries 3
    // (that is -1), entries 2.
    std::array<std::int64_t, 4> counts(std::uint64_t variables) const {
        const std::uint64_t l = low & variables, h = high & variables;
        return {__builtin_popcountll(l | h), 0, __builtin_popcountll(l & h), __builtin_popcountll(h & ~l)};
    }
};

int_vector descend_packed(const phase_level& level, const int_vector& start) {
    const std::size_t size = start.size();
    const std::uint64_t variables = (std::uint64_t{1} << (size - 1)) - 1;
    std::vector<packed_vector> moves;
    for (const auto& m : level.null_moves()) moves.push_back(packed_vector::from(m));
    packed_vector current = packed_vector::from(start);
    readability_key current_key = readability(start, 1);
    for (int round = 0; round < 256; ++round) {
        std::optional<packed_vector> improved;
        readability_key improved_key = current_key;
        std::array<std::int64_t, 4> improved_counts = current.counts(variables);
        auto consider = [&](const packed_vector& candidate) {
            const auto counts = candidate.counts(variables);
            if (improved_counts < counts) return;
            readability_key key = readability(candidate.unpack(size), 1);
            if (key < improved_key) {
                improved_key = std::move(key);
                improved_counts = counts;
                improved = candidate;
            }
        };
        for (const auto& m : moves) consider(current.plus(m));
        if (!improved)
            for (std::size_t a = 0; a < moves.size(); ++a) {
                const packed_vector partial = current.plus(moves[a]);
                for (std::size_t b = a + 1; b < moves.size(); ++b) consider(partial.plus(moves[b]));
            }
        if (!improved) break;
        current = *improved;
        current_key = std::move(improved_key);
    }
    return current.unpack(size);
}

}  // namespace

int_vector descend_by_null_moves(const phase_level& level, const int_vector& start) {
    if (level.modulus() == 4 && start.size() <= 64) return descend_packed(level, start);
    return descend_any_level(level, start);
}

}  // namespace couplet::phase::detail
