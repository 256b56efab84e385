package org.headway.network;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import org.headway.caution.InputException;
import org.headway.system.FlowContext;
import org.headway.system.SiteAtmosphere;

/**
 * A network of nodes and links with one fluid state and site atmosphere.
 *
 * <p>Heads are energy heads with the velocity head at nodes neglected, the usual convention of
 * network analysis (Todini &amp; Pilati 1988; Rossman, EPANET 2 Users Manual, EPA/600/R-00/057,
 * 2000, §3.1): a node's gauge pressure is ρ g (H − z). A pipe's own rise is not used; the nodes'
 * elevations are.
 *
 * @param title title for reports
 * @param context fluid state and default friction method
 * @param nodes the nodes, ids unique
 * @param links the links, ids unique and distinct from node ids' namespace (links and nodes may
 *     share an id)
 * @param site barometric pressure for absolute pressures
 */
public record Network(String title, FlowContext context, List<Node> nodes, List<Link> links, SiteAtmosphere site) {

    public Network {
        Objects.requireNonNull(context, "context");
        nodes = List.copyOf(nodes);
        links = List.copyOf(links);
        site = site == null ? SiteAtmosphere.SEA_LEVEL : site;
        title = title == null ? "" : title;
        if (nodes.isEmpty()) {
            throw new InputException("nodes", "a network needs at least one node");
        }
        Map<String, Integer> seen = new HashMap<>();
        for (int i = 0; i < nodes.size(); i++) {
            if (seen.put(nodes.get(i).id(), i) != null) {
                throw new InputException(
                        "nodes[" + i + "].id", "node id \"" + nodes.get(i).id() + "\" is used twice");
            }
        }
        Map<String, Integer> linkIds = new HashMap<>();
        for (int i = 0; i < links.size(); i++) {
            Link l = links.get(i);
            if (linkIds.put(l.id(), i) != null) {
                throw new InputException("links[" + i + "].id", "link id \"" + l.id() + "\" is used twice");
            }
            if (!seen.containsKey(l.from())) {
                throw new InputException(
                        "links[" + i + "].from", "link \"" + l.id() + "\" starts at unknown node \"" + l.from() + "\"");
            }
            if (!seen.containsKey(l.to())) {
                throw new InputException(
                        "links[" + i + "].to", "link \"" + l.id() + "\" ends at unknown node \"" + l.to() + "\"");
            }
        }
    }

    /** Index of each node id. */
    public Map<String, Integer> nodeIndex() {
        Map<String, Integer> index = new HashMap<>(nodes.size() * 2);
        for (int i = 0; i < nodes.size(); i++) {
            index.put(nodes.get(i).id(), i);
        }
        return index;
    }

    /** The same network with other nodes (e.g. another demand case), links unchanged. */
    public Network withNodes(List<Node> newNodes) {
        return new Network(title, context, newNodes, links, site);
    }

    /** The same network with other links. */
    public Network withLinks(List<Link> newLinks) {
        return new Network(title, context, nodes, newLinks, site);
    }

    /** Node ids in order. */
    public List<String> nodeIds() {
        List<String> ids = new ArrayList<>(nodes.size());
        for (Node n : nodes) {
            ids.add(n.id());
        }
        return ids;
    }
}
