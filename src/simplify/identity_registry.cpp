#include "simplify/identity_registry.hpp"

#include "coupling/rewrites.hpp"
#include "network/move.hpp"
#include "network/rewrites.hpp"
#include "rules/rewrites.hpp"
#include "rules/rule.hpp"
#include "simplify/stage_identities.hpp"
#include "tensor/wigner_eckart_stage.hpp"

namespace couplet {

const std::vector<const identity*>& all_identities() {
    static const std::vector<const identity*> all = [] {
        std::vector<const identity*> out;
        for (const rules::sum_rule& r : rules::sum_rules()) out.push_back(&r);
        for (const rules::local_rule& r : rules::local_rules()) out.push_back(&r);
        for (const network::move& m : network::network_moves()) out.push_back(&m);
        out.push_back(&network::interchange_move());
        for (const identity* code : {
                 // recoupling stage
                 &coupling::three_angular_momenta_identity(),
                 &coupling::two_pairs_identity(),
                 &coupling::exchanged_parts_identity(),
                 &coupling::orthonormal_states_identity(),
                 &coupling::recoupling_by_trees_identity(),
                 // tensor operators
                 &tensor::wigner_eckart_identity(),
                 // m-sum stage
                 &network::completeness_identity(),
                 &network::projection_delta_identity(),
                 &network::fixed_projection_identity(),
                 &network::two_line_cut_identity(),
                 &network::three_line_cut_identity(),
                 // j-sum stage
                 &rules::odd_symbol_identity(),
                 &rules::repeated_delta_identity(),
                 &rules::delta_elimination_identity(),
                 &rules::delta_collapse_identity(),
                 &rules::sum_split_identity(),
                 &rules::sums_merged_identity(),
                 &rules::sums_merged_renamed_identity(),
                 &rules::ninej_expansion_identity(),
                 // the pipeline
                 &clebsch_as_threej_identity(),
                 &phase_reduction_identity(),
                 &closed_form_identity(),
                 &projection_range_identity(),
                 &input_form_identity(),
             })
            out.push_back(code);
        return out;
    }();
    return all;
}

}  // namespace couplet
