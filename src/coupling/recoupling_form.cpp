#include "coupling/recoupling_form.hpp"

#include <algorithm>
#include <array>
#include <map>

#include "model/fresh_index.hpp"
#include "model/structure.hpp"
#include "model/symbols.hpp"

namespace couplet::coupling {

using namespace GiNaC;

namespace {

// An ordered tree that the path rearranges: nodes in an arena, each a leaf or two parts.
struct node {
    ex label;
    leaf_set leaves = 0;
    int left = -1, right = -1;
    bool is_leaf() const { return left < 0; }
};

class ordered_tree {
public:
    ordered_tree(const coupling_tree& side, const std::vector<ex>& leaf_order) { root_ = add(side, leaf_order); }

    int root() const { return root_; }
    node& at(int i) { return nodes_[static_cast<std::size_t>(i)]; }
    int find(leaf_set s) const {
        for (std::size_t i = 0; i < nodes_.size(); ++i)
            if (nodes_[i].leaves == s && (nodes_[i].is_leaf() || reachable(static_cast<int>(i))))
                return static_cast<int>(i);
        return -1;
    }
    int add_node(const ex& label, int left, int right) {
        nodes_.push_back({label, static_cast<leaf_set>(at(left).leaves | at(right).leaves), left, right});
        return static_cast<int>(nodes_.size()) - 1;
    }
    // The couplings of the current tree (root included), each with its parts.
    void visit(int i, const std::function<void(node&)>& f) {
        if (at(i).is_leaf()) return;
        f(at(i));
        const int l = at(i).left, r = at(i).right;
        visit(l, f);
        visit(r, f);
    }

private:
    int add(const coupling_tree& t, const std::vector<ex>& leaf_order) {
        if (t.is_leaf()) {
            const auto it =
                std::find_if(leaf_order.begin(), leaf_order.end(), [&](const ex& l) { return l.is_equal(t.label); });
            nodes_.push_back({t.label, static_cast<leaf_set>(1u << (it - leaf_order.begin())), -1, -1});
            return static_cast<int>(nodes_.size()) - 1;
        }
        const int l = add(t.parts[0], leaf_order), r = add(t.parts[1], leaf_order);
        return add_node(t.label, l, r);
    }
    bool reachable(int target) const {
        std::vector<int> stack{root_};
        while (!stack.empty()) {
            const int i = stack.back();
            stack.pop_back();
            if (i == target) return true;
            const node& n = nodes_[static_cast<std::size_t>(i)];
            if (!n.is_leaf()) {
                stack.push_back(n.left);
                stack.push_back(n.right);
            }
        }
        return false;
    }

    std::vector<node> nodes_;
    int root_ = -1;
};

ex hat(const ex& j) { return 2 * j + 1; }

// |(A B) c> = (-1)^(a+b-c) |(B A) c>: the symmetry of the Clebsch-Gordan coefficient
// (Edmonds 3.5.14, DLMF 34.3.5 with 34.3.1).
ex exchange_parts(ordered_tree& t, int i) {
    node& n = t.at(i);
    const ex phase = make_phase(t.at(n.left).label + t.at(n.right).label - n.label);
    std::swap(n.left, n.right);
    return phase;
}

class path_runner {
public:
    path_runner(const coupling_tree& bra, const std::vector<ex>& leaf_order, const quantum_numbers& numbers,
                const ex& context)
        : tree_(bra, leaf_order), numbers_(numbers), context_(context) {}

    // |((A B) e, C) f> = sum_g (-1)^(a+b+c+f) sqrt((2e+1)(2g+1)) {a b e; c f g} |(A, (B C) g) f>
    // (Edmonds 6.1.5).
    void sixj_step(const recoupling_step& step) {
        const int p = tree_.find(step.parent);
        const leaf_set inner = step.removed[0], other = static_cast<leaf_set>(step.parent & ~inner);
        if (tree_.at(tree_.at(p).left).leaves != inner) coefficient_ *= exchange_parts(tree_, p);
        const int x = tree_.at(p).left, c = tree_.at(p).right;
        const leaf_set joining = static_cast<leaf_set>(step.added[0] & ~other);
        if (tree_.at(tree_.at(x).right).leaves != joining) coefficient_ *= exchange_parts(tree_, x);
        const int a = tree_.at(x).left, b = tree_.at(x).right;
        const ex g = new_label();
        const ex &la = tree_.at(a).label, &lb = tree_.at(b).label, &lc = tree_.at(c).label, &e = tree_.at(x).label,
                 &f = tree_.at(p).label;
        coefficient_ *= make_phase(la + lb + lc + f) * sqrt(hat(e) * hat(g)) * wigner6j(la, lb, e, lc, f, g);
        const int bc = tree_.add_node(g, b, c);
        tree_.at(p).left = a;
        tree_.at(p).right = bc;
    }

    // |((A B) e, (C D) g) f> = sum_{h,k} sqrt((2e+1)(2g+1)(2h+1)(2k+1)) {a b e; c d g; h k f}
    // |((A C) h, (B D) k) f> (Edmonds 6.4.2).
    void ninej_step(const recoupling_step& step) {
        const int p = tree_.find(step.parent);
        const int x = tree_.at(p).left;
        int y = tree_.at(p).right;
        const leaf_set first = (step.added[0] & tree_.at(tree_.at(x).left).leaves) ? step.added[0] : step.added[1];
        const leaf_set second = first == step.added[0] ? step.added[1] : step.added[0];
        if (!(tree_.at(tree_.at(y).left).leaves & first)) coefficient_ *= exchange_parts(tree_, y);
        const int a = tree_.at(x).left, b = tree_.at(x).right, c = tree_.at(y).left, d = tree_.at(y).right;
        (void)second;
        const ex h = new_label(), k = new_label();
        coefficient_ *= sqrt(hat(tree_.at(x).label) * hat(tree_.at(y).label) * hat(h) * hat(k)) *
                        wigner9j(tree_.at(a).label, tree_.at(b).label, tree_.at(x).label, tree_.at(c).label,
                                 tree_.at(d).label, tree_.at(y).label, h, k, tree_.at(p).label);
        const int ac = tree_.add_node(h, a, c), bd = tree_.add_node(k, b, d);
        tree_.at(p).left = ac;
        tree_.at(p).right = bd;
    }

    // The tree now has the ket's shape: its parts put in the ket's order, its labels made the
    // ket's (an introduced label becomes the ket's, a label of the bra meets it in a delta).
    ex finish(const coupling_tree& ket, const std::vector<ex>& leaf_order) {
        ordered_tree target(ket, leaf_order);
        exmap final_labels;
        target.visit(target.root(), [&](node& wanted) {
            const int i = tree_.find(wanted.leaves);
            node& have = tree_.at(i);
            if (tree_.at(have.left).leaves != target.at(wanted.left).leaves) coefficient_ *= exchange_parts(tree_, i);
            const ex& label = tree_.at(i).label;
            if (is_introduced(label)) {
                final_labels[label] = wanted.label;
            } else if (!label.is_equal(wanted.label)) {
                coefficient_ *= kdelta(label, wanted.label);
                same_as_bra_[wanted.label] = label;
            }
        });
        ex value = coefficient_.subs(final_labels);
        lst summed;
        for (const ex& x : introduced_)
            if (!final_labels.count(x)) summed.append(x);
        return summed.nops() ? make_sum(value, summed) : value;
    }

    // The ket's labels that a delta makes equal to the bra's.
    const exmap& same_as_bra() const { return same_as_bra_; }

private:
    ex new_label() {
        const symbol x =
            fresh_index(lst{context_, coefficient_, lst(introduced_.begin(), introduced_.end())}, numbers_);
        introduced_.push_back(x);
        return x;
    }
    bool is_introduced(const ex& label) const {
        return std::any_of(introduced_.begin(), introduced_.end(), [&](const ex& x) { return x.is_equal(label); });
    }

    ordered_tree tree_;
    const quantum_numbers& numbers_;
    ex context_;
    ex coefficient_ = 1;
    std::vector<ex> introduced_;
    exmap same_as_bra_;
};

using triad = std::array<ex, 3>;

triad sorted_triad(ex a, ex b, ex c) {
    triad t{a, b, c};
    std::sort(t.begin(), t.end(), ex_is_less());
    return t;
}

bool same_triad(const triad& x, const triad& y) {
    return x[0].is_equal(y[0]) && x[1].is_equal(y[1]) && x[2].is_equal(y[2]);
}

// tri(a, b, c) for each coupling of either side whose triad no symbol of `value` carries, a
// ket label read as the bra's where a delta makes them equal.
ex uncovered_triangles(const ex& value, const coupling_tree& bra, const coupling_tree& ket, const exmap& same) {
    coupling_structure carried;
    for (const_preorder_iterator it = value.preorder_begin(); it != value.preorder_end(); ++it)
        add_structure(*it, carried);
    std::vector<triad> have;
    for (const auto& t : carried.triads) have.push_back(sorted_triad(t[0], t[1], t[2]));
    ex out = 1;
    std::function<void(const coupling_tree&, const exmap&)> walk = [&](const coupling_tree& t, const exmap& as) {
        if (t.is_leaf()) return;
        const ex a = t.parts[0].label.subs(as), b = t.parts[1].label.subs(as), c = t.label.subs(as);
        const triad mine = sorted_triad(a, b, c);
        const bool covered = std::any_of(have.begin(), have.end(), [&](const triad& h) { return same_triad(h, mine); });
        if (!covered) {
            out *= triangle(a, b, c);
            have.push_back(mine);
        }
        walk(t.parts[0], as);
        walk(t.parts[1], as);
    };
    walk(bra, {});
    walk(ket, same);
    return out;
}

std::vector<ex> leaf_order_of(const coupling_tree& bra) {
    std::vector<ex> out;
    for (const coupling_tree* leaf : leaves_of(bra)) out.push_back(leaf->label);
    return out;
}

}  // namespace

tree_shape shape_of(const coupling_tree& side, const std::vector<ex>& leaf_order) {
    ordered_tree t(side, leaf_order);
    tree_shape out;
    t.visit(t.root(), [&](node& n) { out.couplings.push_back(n.leaves); });
    std::sort(out.couplings.begin(), out.couplings.end());
    return out;
}

recoupling_form closed_recoupling(const coupling_tree& bra, const coupling_tree& ket, const quantum_numbers& numbers,
                                  const ex& context, const search_options& options) {
    const std::vector<ex> leaves = leaf_order_of(bra);
    const recoupling_path path = cheapest_recoupling(shape_of(bra, leaves), shape_of(ket, leaves), options);
    path_runner runner(bra, leaves, numbers, context);
    for (const recoupling_step& step : path.steps) {
        if (step.is_ninej())
            runner.ninej_step(step);
        else
            runner.sixj_step(step);
    }
    ex value = runner.finish(ket, leaves);
    // A delta between a bra label and a ket label leaves one name in the answer.
    value *= uncovered_triangles(value, bra, ket, runner.same_as_bra());
    return recoupling_form{value, path.cost, path.cheapest};
}

}  // namespace couplet::coupling
