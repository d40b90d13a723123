#include "phase/representative_search.hpp"

#include "phase/null_move_descent.hpp"
#include "phase/readability.hpp"

#include <array>
#include <cstdint>
#include <optional>
#include <string>
#include <unordered_map>
#include <utility>
#include <vector>

namespace couplet::phase::detail {

namespace {

std::int64_t mod(std::int64_t x, std::int64_t q) {
    const std::int64_t r = x % q;
    return r < 0 ? r + q : r;
}

bool is_zero(const int_vector& v) {
    for (auto x : v)
        if (x != 0) return false;
    return true;
}

struct small_term {
    std::uint32_t variable;
    std::int64_t coefficient;  // in [1, q)
};
using term_pair = std::array<small_term, 2>;

// Signature tails (all entries but the first, which the constant absorbs) as values of Z/4:
// bit k of `low` and `high` hold entry k, so adding two tails is a few word operations.
struct packed_tails {
    struct key {
        std::uint64_t low = 0, high = 0;
        bool operator==(const key& o) const { return low == o.low && high == o.high; }
    };
    struct hash {
        std::size_t operator()(const key& k) const {
            return std::hash<std::uint64_t>()(k.low * 0x9e3779b97f4a7c15ULL ^ k.high);
        }
    };
    static bool fits(std::int64_t q, std::size_t width) { return q == 4 && width <= 64; }
    key make(const int_vector& tail) const {
        key k;
        for (std::size_t i = 0; i < tail.size(); ++i) {
            k.low |= static_cast<std::uint64_t>(tail[i] & 1) << i;
            k.high |= static_cast<std::uint64_t>((tail[i] >> 1) & 1) << i;
        }
        return k;
    }
    key add(const key& a, const key& b) const { return {a.low ^ b.low, a.high ^ b.high ^ (a.low & b.low)}; }
    key subtract(const key& a, const key& b) const { return add(a, {b.low, b.high ^ b.low}); }
    bool is_zero(const key& k) const { return k.low == 0 && k.high == 0; }
};

// Any modulus: tails as vectors.
struct vector_tails {
    std::int64_t q;
    using key = int_vector;
    struct hash {
        std::size_t operator()(const key& k) const {
            std::size_t h = 0;
            for (auto x : k) h = h * 1000003u ^ static_cast<std::size_t>(x);
            return h;
        }
    };
    key make(const int_vector& tail) const { return tail; }
    key add(const key& a, const key& b) const {
        key s(a.size());
        for (std::size_t i = 0; i < a.size(); ++i) s[i] = mod(a[i] + b[i], q);
        return s;
    }
    key subtract(const key& a, const key& b) const {
        key s(a.size());
        for (std::size_t i = 0; i < a.size(); ++i) s[i] = mod(a[i] - b[i], q);
        return s;
    }
    bool is_zero(const key& k) const { return detail::is_zero(k); }
};

template <class Tails>
struct tables : small_term_tables {
    explicit tables(Tails t) : tails(std::move(t)) {}
    Tails tails;
    std::vector<std::pair<small_term, typename Tails::key>> singles;
    std::vector<std::pair<term_pair, typename Tails::key>> pairs;
    std::unordered_map<typename Tails::key, std::vector<term_pair>, typename Tails::hash> pairs_by_tail;
};

template <class Tails>
std::unique_ptr<small_term_tables> build(const phase_level& level, Tails tails) {
    auto t = std::make_unique<tables<Tails>>(std::move(tails));
    const std::int64_t q = level.modulus();
    const auto& rows = level.rows();
    for (std::uint32_t i = 0; i < level.variables(); ++i) {
        if (is_zero(rows[i])) continue;  // such a term never changes the phase
        for (std::int64_t a = 1; a < q; ++a) {
            int_vector tail(rows[i].begin() + 1, rows[i].end());
            for (auto& x : tail) x = mod(x * a, q);
            t->singles.push_back({{i, a}, t->tails.make(tail)});
        }
    }
    for (std::size_t x = 0; x < t->singles.size(); ++x) {
        for (std::size_t y = x + 1; y < t->singles.size(); ++y) {
            const auto& [s, s_tail] = t->singles[x];
            const auto& [u, u_tail] = t->singles[y];
            if (u.variable == s.variable) continue;
            const term_pair pair{s, u};
            auto tail = t->tails.add(s_tail, u_tail);
            t->pairs_by_tail[tail].push_back(pair);
            t->pairs.emplace_back(pair, std::move(tail));
        }
    }
    return t;
}

// Keeps the most readable of the candidates offered.
class best_form {
public:
    explicit best_form(std::int64_t level) : level_(level) {}
    void offer(const int_vector& w) {
        readability_key key = readability(w, level_);
        if (!best_ || key < key_) {
            best_ = w;
            key_ = std::move(key);
        }
    }
    const std::optional<int_vector>& best() const { return best_; }

private:
    std::int64_t level_;
    std::optional<int_vector> best_;
    readability_key key_;
};

// The form with the given terms whose constant makes its signature `target`.
int_vector assemble(const phase_level& level, const small_term* terms, std::size_t count, const int_vector& target) {
    const std::int64_t q = level.modulus();
    int_vector w(level.variables() + 1, 0);
    std::int64_t head = 0;
    for (std::size_t t = 0; t < count; ++t) {
        w[terms[t].variable] = terms[t].coefficient;
        head = mod(head + terms[t].coefficient * level.rows()[terms[t].variable][0], q);
    }
    w.back() = mod(target[0] - head, q);
    return w;
}

// Every form of at most four variable terms with the target signature; the best of the shortest.
template <class Tails>
std::optional<int_vector> shortest_small_form(const phase_level& level, const tables<Tails>& t,
                                              const int_vector& target) {
    const Tails& tails = t.tails;
    const auto tail = tails.make(int_vector(target.begin() + 1, target.end()));
    best_form best(level.level());
    auto pairs_with = [&](const typename Tails::key& key) -> const std::vector<term_pair>* {
        auto it = t.pairs_by_tail.find(key);
        return it == t.pairs_by_tail.end() ? nullptr : &it->second;
    };

    if (tails.is_zero(tail)) {
        best.offer(assemble(level, nullptr, 0, target));
        return best.best();
    }
    for (const auto& [term, single_tail] : t.singles)
        if (single_tail == tail) best.offer(assemble(level, &term, 1, target));
    if (best.best()) return best.best();

    if (const auto* found = pairs_with(tail))
        for (const auto& pair : *found) best.offer(assemble(level, pair.data(), 2, target));
    if (best.best()) return best.best();

    for (const auto& [term, single_tail] : t.singles) {
        const auto* found = pairs_with(tails.subtract(tail, single_tail));
        if (!found) continue;
        for (const auto& pair : *found) {
            if (pair[0].variable <= term.variable) continue;  // each triple once, in order
            const small_term terms[3] = {term, pair[0], pair[1]};
            best.offer(assemble(level, terms, 3, target));
        }
    }
    if (best.best()) return best.best();

    for (const auto& [first, pair_tail] : t.pairs) {
        const auto* found = pairs_with(tails.subtract(tail, pair_tail));
        if (!found) continue;
        for (const auto& second : *found) {
            if (second[0].variable <= first[1].variable) continue;
            const small_term terms[4] = {first[0], first[1], second[0], second[1]};
            best.offer(assemble(level, terms, 4, target));
        }
    }
    return best.best();
}

std::string memo_key(const int_vector& v) {
    std::string key;
    key.reserve(v.size());
    for (auto x : v)
        for (int b = 0; b < 8; ++b) key.push_back(static_cast<char>((x >> (8 * b)) & 0xff));
    return key;
}

}  // namespace

std::unique_ptr<small_term_tables> build_small_term_tables(const phase_level& level) {
    const std::size_t width = level.rows().empty() ? 0 : level.rows()[0].size() - 1;
    if (packed_tails::fits(level.modulus(), width)) return build(level, packed_tails{});
    return build(level, vector_tails{level.modulus()});
}

const int_vector& readable_representative(const phase_level& level, const int_vector& reduced) {
    auto& memo = level.memo();
    const std::string key = memo_key(reduced);
    if (auto it = memo.find(key); it != memo.end()) return it->second;
    const int_vector target = level.signature(reduced);
    const small_term_tables& t = level.tables();
    std::optional<int_vector> found;
    if (const auto* packed = dynamic_cast<const tables<packed_tails>*>(&t))
        found = shortest_small_form(level, *packed, target);
    else
        found = shortest_small_form(level, dynamic_cast<const tables<vector_tails>&>(t), target);
    int_vector chosen = found ? *found : descend_by_null_moves(level, reduced);
    return memo.emplace(key, std::move(chosen)).first->second;
}

}  // namespace couplet::phase::detail
